import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/roles';
import { apiUser } from '@/lib/server/auth';
import { noTerminal } from '@/lib/server/yard-api';

// The board for SWR: always fresh, never cached.
export const dynamic = 'force-dynamic';

export async function GET() {
  const user = await apiUser(SECTION_ROLES.yard);
  if (user instanceof Response) return user;
  if (!user.terminalId) return noTerminal();
  const board = await getBoard(user.terminalId);
  if (!board) return noTerminal();
  return Response.json(board, { headers: { 'Cache-Control': 'no-store' } });
}
