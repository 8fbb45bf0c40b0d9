import type { Metadata } from 'next';
import { getTranslations } from 'next-intl/server';
import { Caution } from '@/app/_components/caution';
import { EmptyState } from '@/app/_components/empty-state';
import { getBoard } from '@/db/queries/yard-board';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { YardNav } from '../_components/yard-nav';
import { MoveForm } from './_components/move-form';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Yard'))('move.title') };
}

export default async function MovesPage() {
  const user = await requireUser(SECTION_ROLES.yard);
  const board = user.terminalId ? await getBoard(user.terminalId) : null;
  const t = await getTranslations('Yard');
  const c = await getTranslations('Cautions');
  if (!board) return <EmptyState title={t('noTerminal')}>{t('askAdmin')}</EmptyState>;
  const units = board.spots.flatMap((s) => (s.trailer ? [s.trailer.unitNumber] : []));
  const freeSpots = board.spots.filter((s) => !s.trailer).map((s) => s.label);
  return (
    <div className="space-y-3">
      <YardNav current="/yard/moves" />
      <h1 className="text-gate-xl font-bold">{t('move.title')}</h1>
      <p className="text-gate">{t('move.intro')}</p>
      <Caution title={t('move.oosTitle')}>
        {c('outOfService')} {t('move.oosYardOnly')} {c('inspection')}
      </Caution>
      <MoveForm units={units} freeSpots={freeSpots} />
    </div>
  );
}
