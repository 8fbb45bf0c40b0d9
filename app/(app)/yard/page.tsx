import type { Metadata } from 'next';
import { EmptyState } from '@/app/_components/empty-state';
import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { firstLoadBoard } from '@/lib/yard/row-window';
import { YardBoard } from './_components/yard-board';
import { YardNav } from './_components/yard-nav';

export const metadata: Metadata = { title: 'Yard board' };

export default async function YardPage() {
  const user = await requireUser(SECTION_ROLES.yard);
  const board = user.terminalId ? await getBoard(user.terminalId) : null;
  return (
    <div>
      <YardNav current="/yard" />
      {board ? (
        // a big yard's first rows only: the page stays small, the first refresh brings the rest
        <YardBoard initial={firstLoadBoard(board)} />
      ) : (
        <EmptyState title="No home terminal">
          Ask an admin to set your home terminal to see its yard.
        </EmptyState>
      )}
    </div>
  );
}
