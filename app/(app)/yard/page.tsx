import type { Metadata } from 'next';
import { getLocale } from 'next-intl/server';
import { EmptyState } from '@/app/_components/empty-state';
import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { YardBoard } from './_components/yard-board';
import { YardNav } from './_components/yard-nav';

export const metadata: Metadata = { title: 'Yard board' };

export default async function YardPage() {
  const user = await requireUser(SECTION_ROLES.yard);
  const board = user.terminalId ? await getBoard(user.terminalId, new Date(), await getLocale()) : null;
  return (
    <div>
      <YardNav current="/yard" />
      {board ? (
        <YardBoard initial={board} />
      ) : (
        <EmptyState title="No home terminal">
          Ask an admin to set your home terminal to see its yard.
        </EmptyState>
      )}
    </div>
  );
}
