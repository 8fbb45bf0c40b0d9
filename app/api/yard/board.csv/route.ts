import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { NO_TERMINAL } from '@/lib/server/yard-api';
import { boardQuerySchema } from '@/lib/validation/yard';
import { filterRows, tableRows, type BoardFilter } from '@/lib/yard/board';
import { boardCsv } from '@/lib/yard/csv';
import { sortRows, type SortDir, type SortKey } from '@/lib/yard/table';

export const dynamic = 'force-dynamic';

/** The board table as CSV: same filters, order, columns and cells as the screen. */
export const GET = route(
  { access: SECTION_ROLES.yard, query: boardQuerySchema, invalidMessage: 'Unknown filter or sort.' },
  async ({ user, query }) => {
    const board = user.terminalId ? await getBoard(user.terminalId) : null;
    if (!board) return NO_TERMINAL;
    const now = new Date(board.generatedAt);
    const rows = sortRows(
      filterRows(tableRows(board), query.filter as BoardFilter[], board.policy, now),
      query.sort as SortKey,
      query.dir as SortDir,
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
  },
);
