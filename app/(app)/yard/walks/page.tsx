import type { Metadata } from 'next';
import Link from 'next/link';
import { ActionForm } from '@/app/_components/action-form';
import { Caution, CAUTIONS } from '@/app/_components/caution';
import { EmptyState } from '@/app/_components/empty-state';
import { listLayout } from '@/db/queries/yard-layout';
import { listRecentWalks } from '@/db/queries/yard-walks';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { formatTime } from '@/lib/format/time';
import { YardNav } from '../_components/yard-nav';
import { RowChoice } from './_components/row-choice';
import { startWalkAction } from './actions';

export const metadata: Metadata = { title: 'Yard walks' };

export default async function WalksPage() {
  const user = await requireUser(SECTION_ROLES.yard);
  if (!user.terminalId)
    return <EmptyState title="No home terminal">Ask an admin to set your home terminal.</EmptyState>;
  const [{ rows }, walks] = await Promise.all([
    listLayout(user.terminalId),
    listRecentWalks(user.terminalId),
  ]);
  const tz = user.terminalTimeZone ?? 'UTC';
  return (
    <div className="space-y-4">
      <YardNav current="/yard/walks" />
      <h1 className="text-gate-xl font-bold">Yard walk</h1>
      <Caution title="Walking the yard">{CAUTIONS.yardWalk}</Caution>
      <section aria-labelledby="start-title" className="rounded-xl bg-paper p-4 shadow">
        <h2 id="start-title" className="text-gate-lg font-bold">
          Start a walk
        </h2>
        <ActionForm action={startWalkAction} submitLabel="Start walk" pendingLabel="Starting…">
          <RowChoice rows={rows} />
        </ActionForm>
      </section>
      <section aria-labelledby="recent-title">
        <h2 id="recent-title" className="text-gate-lg font-bold">
          Recent walks
        </h2>
        {walks.length === 0 ? (
          <p className="text-gate">No walks yet.</p>
        ) : (
          <ul className="space-y-1">
            {walks.map((w) => (
              <li key={w.id}>
                <Link
                  href={`/yard/walks/${w.id}`}
                  className="flex min-h-tap items-center gap-2 rounded-lg bg-paper px-3 text-gate underline"
                >
                  {formatTime(w.startedAt, tz)} · {w.startedBy} ·{' '}
                  {w.status === 'finished' ? 'finished' : 'in progress'}
                  {w.summary
                    ? ` · ${w.summary.matched ?? 0} matched, ${w.summary.wrong_slot ?? 0} wrong slot, ${w.summary.missing ?? 0} missing, ${w.summary.unknown ?? 0} unknown`
                    : ''}
                </Link>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
