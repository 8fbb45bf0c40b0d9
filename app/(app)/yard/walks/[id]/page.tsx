import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getTranslations } from 'next-intl/server';
import { Caution } from '@/app/_components/caution';
import { listWalkOutcomes } from '@/db/queries/yard-outcomes';
import { getWalk } from '@/db/queries/yard-walks';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { YardNav } from '../../_components/yard-nav';
import { WalkResult } from './_components/walk-result';
import { WalkScanner } from './_components/walk-scanner';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Walk'))('title') };
}

export default async function WalkPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireUser(SECTION_ROLES.yard);
  const { id } = await params;
  if (!z.uuid().safeParse(id).success || !user.terminalId) notFound();
  const walk = await getWalk(id, user.terminalId);
  if (!walk) notFound();
  const rowNames = walk.rows.map((r) => r.name).join(', ');
  const t = await getTranslations('Walk');
  const c = await getTranslations('Cautions');
  return (
    <div className="space-y-3">
      <YardNav current="/yard/walks" />
      <h1 className="text-gate-xl font-bold">{t('titleRows', { rows: rowNames })}</h1>
      {walk.status === 'in_progress' ? <Caution title={c('titles.yardWalk')}>{c('yardWalk')}</Caution> : null}
      {walk.status === 'in_progress' ? (
        <WalkScanner
          walkId={walk.id}
          spots={walk.spots}
          stored={walk.scans.map((s) => ({
            clientKey: s.clientKey,
            text: s.scannedText,
            unitNumber: s.unitNumber,
            spotLabel: s.spotLabel,
          }))}
        />
      ) : (
        <WalkResult
          summary={walk.summary ?? {}}
          outcomes={await listWalkOutcomes(walk.id, user.terminalId)}
        />
      )}
    </div>
  );
}
