import { z } from 'zod';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { completeUpload } from '@/lib/server/photos/uploads';
import { describeZodError } from '@/lib/validation/errors';
import { idParamSchema, uploadCompleteSchema } from '@/lib/validation/handoffs';

/** The optional JSON body `{ capturedAt }`; an empty body (older phones, scripts) means none. */
async function claimOf(request: Request) {
  const text = await request.text();
  if (!text.trim()) return { ok: true as const, value: {} };
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { ok: false as const, refusal: refuse('bad_request', 'The request body must be JSON.') };
  }
  const parsed = uploadCompleteSchema.safeParse(raw);
  if (parsed.success) return { ok: true as const, value: parsed.data };
  const { message, fieldErrors } = describeZodError(parsed.error);
  return { ok: false as const, refusal: refuse('invalid', message, fieldErrors) };
}

/**
 * Checks the uploaded object (type by content, size, SHA-256) and marks the photo stored or
 * rejected, with the capture time the phone read from the photo (when plausible).
 */
export const POST = route(
  { access: SECTION_ROLES.gate, params: z.object({ id: idParamSchema }), notFound: 'No such upload.' },
  async ({ request, user, params }) => {
    const claim = await claimOf(request);
    if (!claim.ok) return claim.refusal;
    const stored = await completeUpload(params.id, user, claim.value);
    return stored.ok ? Response.json(stored.value) : stored;
  },
);
