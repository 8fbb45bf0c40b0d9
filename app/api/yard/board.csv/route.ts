import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { readBoard } from '@/lib/server/yard/board';
import { boardQuerySchema } from '@/lib/validation/yard';
import { filterRows, tableRows } from '@/lib/yard/board';
import { boardCsv } from '@/lib/yard/csv';
import { sortRows } from '@/lib/yard/table';

export const dynamic = 'force-dynamic';

/** The board table as CSV: same filters, order, columns and cells as the screen. */
export const GET = route(
  { access: SECTION_ROLES.yard, query: boardQuerySchema, invalidMessage: 'Unknown filter or sort.' },
  async ({ user, query }) => {
    const read = await readBoard(user);
    if (!read.ok) return read;
    const board = read.value;
    const now = new Date(board.generatedAt);
    const shown = filterRows(tableRows(board), query.filter, board.policy, now);
    const rows = sortRows(shown, query.sort, query.dir, now);
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
