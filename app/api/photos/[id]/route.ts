import { getPhotoForViewer } from '@/db/queries/handoffs';
import { apiError } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { streamObject } from '@/lib/server/storage';
import { idParamSchema } from '@/lib/validation/handoffs';

/** Streams a stored photo to a user allowed to see its handoff (drivers: their own carrier's only). */
export async function GET(_request: Request, ctx: RouteContext<'/api/photos/[id]'>) {
  const user = await apiUser();
  if (user instanceof Response) return user;
  const id = idParamSchema.safeParse((await ctx.params).id);
  if (!id.success) return apiError('not_found', 'No such photo.');
  const photo = await getPhotoForViewer(id.data, user);
  if (!photo) return apiError('not_found', 'No such photo.');
  const body = await streamObject(photo.objectKey);
  if (!body) return apiError('not_found', 'The photo file is missing.');
  return new Response(body, {
    headers: {
      'content-type': photo.contentType,
      'cache-control': 'private, max-age=3600',
      'x-content-type-options': 'nosniff',
    },
  });
}
