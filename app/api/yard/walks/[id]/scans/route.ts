import { z } from 'zod';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { addWalkScan } from '@/lib/server/yard/walks';
import { walkScanSchema } from '@/lib/validation/yard';

/** One walk scan from the device queue; a re-send with the same clientKey answers 200 with the stored scan. */
export const POST = route(
  {
    access: SECTION_ROLES.yard,
    params: z.object({ id: z.uuid() }),
    notFound: 'No such walk.',
    body: walkScanSchema,
  },
  async ({ user, params, body }) => {
    const stored = await addWalkScan(user, params.id, body);
    if (!stored.ok) return stored;
    return Response.json({ ok: true, ...stored.value }, { status: stored.value.isRepeat ? 200 : 201 });
  },
);
