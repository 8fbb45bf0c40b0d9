import type { Metadata } from 'next';
import { getLocale, getTranslations } from 'next-intl/server';
import { EmptyState } from '@/app/_components/empty-state';
import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
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
        <YardBoard initial={board} />
      ) : (
        <EmptyState title={t('noTerminal')}>{t('askAdminYard')}</EmptyState>
      )}
    </div>
  );
}
