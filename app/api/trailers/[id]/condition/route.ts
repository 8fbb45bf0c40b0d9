import { SECTION_ROLES } from '@/lib/roles';
import { apiError } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { getTrailerCondition } from '@/lib/server/trailer-condition';
import { idParamSchema } from '@/lib/validation/handoffs';

/** The trailer's checklist and, per item, the latest inspected observation with when and by whom. */
export async function GET(_request: Request, ctx: RouteContext<'/api/trailers/[id]/condition'>) {
  const user = await apiUser([...new Set([...SECTION_ROLES.gate, ...SECTION_ROLES.yard])]);
  if (user instanceof Response) return user;
  const id = idParamSchema.safeParse((await ctx.params).id);
  if (!id.success) return apiError('not_found', 'No such trailer.');
  const condition = await getTrailerCondition(id.data, user.role);
  if (!condition) return apiError('not_found', 'No such trailer.');
  return Response.json(condition);
}
