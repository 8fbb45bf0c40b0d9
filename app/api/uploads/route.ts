import { SECTION_ROLES } from '@/lib/auth/roles';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { createUpload, UploadError } from '@/lib/server/uploads';
import { uploadRequestSchema } from '@/lib/validation/handoffs';

/** Announces a photo (type, size, SHA-256) and returns a presigned URL to PUT it to. */
export const POST = route(
  { access: SECTION_ROLES.gate, body: uploadRequestSchema },
  async ({ user, body }) => {
    try {
      return Response.json(await createUpload(body, user), { status: 201 });
    } catch (error) {
      if (error instanceof UploadError) return refuse(error.code, error.message, error.fieldErrors);
      throw error;
    }
  },
);
