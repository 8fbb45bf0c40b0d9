import type { Metadata } from 'next';
import { getLocale, getTranslations } from 'next-intl/server';
import { EmptyState } from '@/app/_components/empty-state';
import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { firstLoadBoard } from '@/lib/yard/row-window';
import { YardBoard } from './_components/yard-board';
import { YardNav } from './_components/yard-nav';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Yard'))('board.title') };
}

export default async function YardPage() {
  const user = await requireUser(SECTION_ROLES.yard);
  const board = user.terminalId ? await getBoard(user.terminalId, new Date(), await getLocale()) : null;
  const t = await getTranslations('Yard');
  return (
    <div>
      <YardNav current="/yard" />
      {board ? (
        // a big yard's first rows only: the page stays small, the first refresh brings the rest
        <YardBoard initial={firstLoadBoard(board)} />
      ) : (
        <EmptyState title={t('noTerminal')}>{t('askAdminYard')}</EmptyState>
      )}
    </div>
  );
}
