import { z } from 'zod';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { completeUpload } from '@/lib/server/photos/uploads';
import { idParamSchema } from '@/lib/validation/handoffs';

/** Checks the uploaded object (type by content, size, SHA-256) and marks the photo stored or rejected. */
export const POST = route(
  { access: SECTION_ROLES.gate, params: z.object({ id: idParamSchema }), notFound: 'No such upload.' },
  async ({ user, params }) => {
    const stored = await completeUpload(params.id, user);
    return stored.ok ? Response.json(stored.value) : stored;
  },
);
