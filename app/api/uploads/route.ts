import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { createUpload } from '@/lib/server/photos/uploads';
import { uploadRequestSchema } from '@/lib/validation/handoffs';

/** Announces a photo (type, size, SHA-256) and returns a presigned URL to PUT it to. */
export const POST = route(
  { access: SECTION_ROLES.gate, body: uploadRequestSchema },
  async ({ user, body }) => {
    const upload = await createUpload(body, user);
    return upload.ok ? Response.json(upload.value, { status: 201 }) : upload;
  },
);
