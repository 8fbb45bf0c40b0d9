import { SECTION_ROLES } from '@/lib/roles';
import { apiError, invalid, readJson } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { createUpload, UploadError } from '@/lib/server/uploads';
import { uploadRequestSchema } from '@/lib/validation/handoffs';

/** Announces a photo (type, size, SHA-256) and returns a presigned URL to PUT it to. */
export async function POST(request: Request) {
  const user = await apiUser(SECTION_ROLES.gate);
  if (user instanceof Response) return user;
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = uploadRequestSchema.safeParse(body.body);
  if (!parsed.success) return invalid(parsed.error);
  try {
    return Response.json(await createUpload(parsed.data, user), { status: 201 });
  } catch (error) {
    if (error instanceof UploadError) return apiError(error.code, error.message, error.fieldErrors);
    throw error;
  }
}
