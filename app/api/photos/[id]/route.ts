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
    let body: ReadableStream | null;
    try {
      body = await streamObject(photo.objectKey);
    } catch (error) {
      // storage down or unreachable: the record is fine, the picture is just not reachable now
      console.error(`[photos] storage unavailable for photo ${params.id}`, error);
      return refuse('unavailable', 'Photo storage cannot be reached right now. Try again in a minute.');
    }
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
