import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/roles';
import { invalid } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { noTerminal } from '@/lib/server/yard-api';
import { boardQuerySchema } from '@/lib/validation/yard';
import { filterRows, tableRows, type BoardFilter } from '@/lib/yard/board';
import { boardCsv } from '@/lib/yard/csv';
import { sortRows, type SortDir, type SortKey } from '@/lib/yard/table';

export const dynamic = 'force-dynamic';

/** The board table as CSV: same filters, order, columns and cells as the screen. */
export async function GET(request: Request) {
  const user = await apiUser(SECTION_ROLES.yard);
  if (user instanceof Response) return user;
  const parsed = boardQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!parsed.success) return invalid(parsed.error, 'Unknown filter or sort.');
  if (!user.terminalId) return noTerminal();
  const board = await getBoard(user.terminalId);
  if (!board) return noTerminal();
  const now = new Date(board.generatedAt);
  const rows = sortRows(
    filterRows(tableRows(board), parsed.data.filter as BoardFilter[], board.policy, now),
    parsed.data.sort as SortKey,
    parsed.data.dir as SortDir,
    now,
  );
  const stamp = board.generatedAt.slice(0, 16).replace(/[-:T]/g, '');
  return new Response(boardCsv(rows, board.terminal.timeZone, now), {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="yard-board-${stamp}.csv"`,
      'Cache-Control': 'no-store',
    },
  });
}
