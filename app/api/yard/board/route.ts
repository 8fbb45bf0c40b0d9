import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { readBoard } from '@/lib/server/yard/board';

// The board for SWR: always fresh, never cached.
export const dynamic = 'force-dynamic';

export const GET = route({ access: SECTION_ROLES.yard }, async ({ user }) => {
  const board = await readBoard(user);
  if (!board.ok) return board;
  return Response.json(board.value, { headers: { 'Cache-Control': 'no-store' } });
});
