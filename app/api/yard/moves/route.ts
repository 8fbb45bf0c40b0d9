import { findTrailerIdByScan } from '@/db/queries/yard-identify';
import { findSpotByLabel, moveTrailer } from '@/db/queries/yard-moves';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { fromYardRefusal, NO_TERMINAL } from '@/lib/server/yard-api';
import { moveSchema } from '@/lib/validation/yard';

/** Records a jockey's move: `{ unit, target }` — unit number, VIN or label link; slot or door label. */
export const POST = route({ access: SECTION_ROLES.yard, body: moveSchema }, async ({ user, body }) => {
  if (!user.terminalId) return NO_TERMINAL;
  const trailerId = await findTrailerIdByScan(body.unit);
  if (!trailerId)
    return refuse('not_found', `No trailer matches ${body.unit}.`, {
      unit: ['No trailer with that unit number, VIN or label.'],
    });
  const spot = await findSpotByLabel(user.terminalId, body.target);
  if (!spot)
    return refuse('not_found', `No slot or door ${body.target} in this yard.`, {
      target: ['No such slot or door in this yard.'],
    });
  const result = await moveTrailer({
    terminalId: user.terminalId,
    actorId: user.id,
    trailerId,
    toSpotId: spot.id,
  });
  if (!result.ok) return fromYardRefusal(result);
  return Response.json(result, { status: 201 });
});
