import { getLocale } from 'next-intl/server';
import { z } from 'zod';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { getTrailerCondition } from '@/lib/server/handoffs/condition';
import { idParamSchema } from '@/lib/validation/handoffs';

const ROLES_AT_GATE_OR_YARD = [...new Set([...SECTION_ROLES.gate, ...SECTION_ROLES.yard])];

/** The trailer's checklist and, per item, the latest inspected observation with when and by whom. */
export const GET = route(
  { access: ROLES_AT_GATE_OR_YARD, params: z.object({ id: idParamSchema }), notFound: 'No such trailer.' },
  async ({ user, params }) => {
    const condition = await getTrailerCondition(params.id, user.role, await getLocale());
    return condition ? Response.json(condition) : refuse('not_found', 'No such trailer.');
  },
);
