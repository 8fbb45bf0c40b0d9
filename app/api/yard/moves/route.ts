import { findTrailerIdByScan } from '@/db/queries/yard-identify';
import { findSpotByLabel, moveTrailer } from '@/db/queries/yard-moves';
import { SECTION_ROLES } from '@/lib/roles';
import { apiError, invalid, readJson } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { noTerminal, refusalResponse } from '@/lib/server/yard-api';
import { moveSchema } from '@/lib/validation/yard';

/** Records a jockey's move: `{ unit, target }` — unit number, VIN or label link; slot or door label. */
export async function POST(request: Request) {
  const user = await apiUser(SECTION_ROLES.yard);
  if (user instanceof Response) return user;
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = moveSchema.safeParse(body.body);
  if (!parsed.success) return invalid(parsed.error);
  if (!user.terminalId) return noTerminal();
  const trailerId = await findTrailerIdByScan(parsed.data.unit);
  if (!trailerId)
    return apiError('not_found', `No trailer matches ${parsed.data.unit}.`, {
      unit: ['No trailer with that unit number, VIN or label.'],
    });
  const spot = await findSpotByLabel(user.terminalId, parsed.data.target);
  if (!spot)
    return apiError('not_found', `No slot or door ${parsed.data.target} in this yard.`, {
      target: ['No such slot or door in this yard.'],
    });
  const result = await moveTrailer({
    terminalId: user.terminalId,
    actorId: user.id,
    trailerId,
    toSpotId: spot.id,
  });
  if (!result.ok) return refusalResponse(result);
  return Response.json(result, { status: 201 });
}
