import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { NO_TERMINAL } from '@/lib/server/yard-api';

// The board for SWR: always fresh, never cached.
export const dynamic = 'force-dynamic';

export const GET = route({ access: SECTION_ROLES.yard }, async ({ user }) => {
  const board = user.terminalId ? await getBoard(user.terminalId) : null;
  if (!board) return NO_TERMINAL;
  return Response.json(board, { headers: { 'Cache-Control': 'no-store' } });
});
