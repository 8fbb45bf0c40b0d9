import { SECTION_ROLES } from '@/lib/roles';
import { apiError } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { completeUpload, UploadError } from '@/lib/server/uploads';
import { idParamSchema } from '@/lib/validation/handoffs';

/** Checks the uploaded object (type by content, size, SHA-256) and marks the photo stored or rejected. */
export async function POST(_request: Request, ctx: RouteContext<'/api/uploads/[id]/complete'>) {
  const user = await apiUser(SECTION_ROLES.gate);
  if (user instanceof Response) return user;
  const id = idParamSchema.safeParse((await ctx.params).id);
  if (!id.success) return apiError('not_found', 'No such upload.');
  try {
    return Response.json(await completeUpload(id.data, user));
  } catch (error) {
    if (error instanceof UploadError) return apiError(error.code, error.message, error.fieldErrors);
    throw error;
  }
}
