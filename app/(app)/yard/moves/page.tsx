import type { Metadata } from 'next';
import { Caution, CAUTIONS } from '@/app/_components/caution';
import { EmptyState } from '@/app/_components/empty-state';
import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { YardNav } from '../_components/yard-nav';
import { MoveForm } from './_components/move-form';

export const metadata: Metadata = { title: 'Move a trailer' };

export default async function MovesPage() {
  const user = await requireUser(SECTION_ROLES.yard);
  const board = user.terminalId ? await getBoard(user.terminalId) : null;
  if (!board)
    return <EmptyState title="No home terminal">Ask an admin to set your home terminal.</EmptyState>;
  const units = board.spots.flatMap((s) => (s.trailer ? [s.trailer.unitNumber] : []));
  const freeSpots = board.spots.filter((s) => !s.trailer).map((s) => s.label);
  return (
    <div className="space-y-3">
      <YardNav current="/yard/moves" />
      <h1 className="text-gate-xl font-bold">Move a trailer</h1>
      <p className="text-gate">
        Scan or type the unit, then the slot or door it goes to. Custody stays with the terminal.
      </p>
      <Caution title="Out-of-service trailers">
        {CAUTIONS.outOfService} It may be moved inside the yard only. {CAUTIONS.inspection}
      </Caution>
      <MoveForm units={units} freeSpots={freeSpots} />
    </div>
  );
}
