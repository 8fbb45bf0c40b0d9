import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { createUpload } from '@/lib/server/photos/uploads';
import { uploadRequestSchema } from '@/lib/validation/handoffs';

/** Announces a photo (type, size, SHA-256) and returns a presigned URL to PUT it to. */
export const POST = route(
  { access: SECTION_ROLES.gate, body: uploadRequestSchema },
  async ({ user, body }) => {
    const upload = await createUpload(body, user);
    if (!upload.ok) return upload;
    // announced again under the phone's id: 200 (a stored photo answers without an upload URL)
    const isAgain = 'status' in upload.value || upload.value.photoId === body.photoId;
    return Response.json(upload.value, { status: isAgain && body.photoId ? 200 : 201 });
  },
);
