import { z } from 'zod';
import { getPhotoForViewer } from '@/db/queries/handoffs';
import { ROLES } from '@/lib/auth/roles';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { streamObject } from '@/lib/server/storage';
import { idParamSchema } from '@/lib/validation/handoffs';

/** Streams a stored photo to a user allowed to see its handoff (drivers: their own carrier's only). */
export const GET = route(
  { access: ROLES, params: z.object({ id: idParamSchema }), notFound: 'No such photo.' },
  async ({ user, params }) => {
    const photo = await getPhotoForViewer(params.id, user);
    if (!photo) return refuse('not_found', 'No such photo.');
    const body = await streamObject(photo.objectKey);
    if (!body) return refuse('not_found', 'The photo file is missing.');
    return new Response(body, {
      headers: {
        'content-type': photo.contentType,
        'cache-control': 'private, max-age=3600',
        'x-content-type-options': 'nosniff',
      },
    });
  },
);
