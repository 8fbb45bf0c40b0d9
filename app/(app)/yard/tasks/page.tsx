import type { Metadata } from 'next';
import { ActionForm } from '@/app/_components/action-form';
import { Caution, CAUTIONS } from '@/app/_components/caution';
import { EmptyState } from '@/app/_components/empty-state';
import { listOpenTasks } from '@/db/queries/yard-tasks';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { formatTime } from '@/lib/format/time';
import { TASK_LABELS } from '@/lib/yard/walk';
import { YardNav } from '../_components/yard-nav';
import { clearTaskAction } from './actions';

export const metadata: Metadata = { title: 'Yard tasks' };

export default async function TasksPage() {
  const user = await requireUser(SECTION_ROLES.yard);
  const tasks = user.terminalId ? await listOpenTasks(user.terminalId) : [];
  const tz = user.terminalTimeZone ?? 'UTC';
  return (
    <div className="space-y-3">
      <YardNav current="/yard/tasks" />
      <h1 className="text-gate-xl font-bold">Yard tasks</h1>
      <Caution title="Reefer units">{CAUTIONS.reefer}</Caution>
      <Caution title="Walking the yard">{CAUTIONS.yardWalk}</Caution>
      {tasks.length === 0 ? (
        <EmptyState title="Nothing to do">
          Tasks appear here when a yard walk finds low fuel, a unit off on a loaded reefer, open doors or a
          missing seal.
        </EmptyState>
      ) : (
        <ul className="space-y-2">
          {tasks.map((t) => (
            <li key={t.id} className="rounded-lg bg-paper p-3 shadow">
              <p className="text-gate font-bold">
                {TASK_LABELS[t.kind]}: {t.unitNumber}
                {t.spotLabel ? ` in ${t.spotLabel}` : ''}
              </p>
              <p className="text-gate-sm text-ink-soft">
                {t.note} Found {formatTime(t.createdAt, tz)}.
              </p>
              {t.kind === 'low_fuel' ? <Caution title="Fuelling">{CAUTIONS.fuelling}</Caution> : null}
              <ActionForm
                action={clearTaskAction}
                submitLabel="Clear"
                pendingLabel="Clearing…"
                variant="secondary"
                hidden={{ id: t.id }}
              />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
