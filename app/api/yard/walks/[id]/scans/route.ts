import { z } from 'zod';
import { addWalkScan } from '@/db/queries/yard-walks';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { fromYardRefusal, NO_TERMINAL } from '@/lib/server/yard-api';
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
    if (!user.terminalId) return NO_TERMINAL;
    const result = await addWalkScan(params.id, user.terminalId, body);
    if (!result.ok) return fromYardRefusal(result);
    return Response.json(result, { status: result.isRepeat ? 200 : 201 });
  },
);
