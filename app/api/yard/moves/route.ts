import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { recordMove } from '@/lib/server/yard/moves';
import { moveSchema } from '@/lib/validation/yard';

/**
 * Records a jockey's move: `{ unit, target, clientKey? }` — unit number, VIN or label link; slot or
 * door label; the phone's key. The same key again answers the move already recorded (200).
 */
export const POST = route({ access: SECTION_ROLES.yard, body: moveSchema }, async ({ user, body }) => {
  const moved = await recordMove(user, body);
  if (!moved.ok) return moved;
  return Response.json({ ok: true, ...moved.value }, { status: moved.value.isReplay ? 200 : 201 });
});
