import { z } from 'zod';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { completeUpload, UploadError } from '@/lib/server/uploads';
import { idParamSchema } from '@/lib/validation/handoffs';

/** Checks the uploaded object (type by content, size, SHA-256) and marks the photo stored or rejected. */
export const POST = route(
  { access: SECTION_ROLES.gate, params: z.object({ id: idParamSchema }), notFound: 'No such upload.' },
  async ({ user, params }) => {
    try {
      return Response.json(await completeUpload(params.id, user));
    } catch (error) {
      if (error instanceof UploadError) return refuse(error.code, error.message, error.fieldErrors);
      throw error;
    }
  },
);
