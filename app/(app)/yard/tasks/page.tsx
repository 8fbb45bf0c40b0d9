import type { Metadata } from 'next';
import { ActionForm } from '@/app/_components/action-form';
import { getLocale, getTranslations } from 'next-intl/server';
import { Caution } from '@/app/_components/caution';
import { EmptyState } from '@/app/_components/empty-state';
import { listOpenTasks } from '@/db/queries/yard-tasks';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { formatTime } from '@/lib/format/time';
import { YardNav } from '../_components/yard-nav';
import { clearTaskAction } from './actions';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Yard'))('tasks.title') };
}

export default async function TasksPage() {
  const user = await requireUser(SECTION_ROLES.yard);
  const tasks = user.terminalId ? await listOpenTasks(user.terminalId) : [];
  const tz = user.terminalTimeZone ?? 'UTC';
  const t = await getTranslations('Yard');
  const locale = await getLocale();
  const c = await getTranslations('Cautions');
  return (
    <div className="space-y-3">
      <YardNav current="/yard/tasks" />
      <h1 className="text-gate-xl font-bold">{t('tasks.title')}</h1>
      <Caution title={c('titles.reefer')}>{c('reefer')}</Caution>
      <Caution title={c('titles.yardWalk')}>{c('yardWalk')}</Caution>
      {tasks.length === 0 ? (
        <EmptyState title={t('tasks.nothing')}>{t('tasks.nothingText')}</EmptyState>
      ) : (
        <ul className="space-y-2">
          {tasks.map((task) => (
            <li key={task.id} className="rounded-lg bg-paper p-3 shadow">
              <p className="text-gate font-bold">
                {t(`tasks.kind.${task.kind}`)}: {task.unitNumber}
                {task.spotLabel ? ` ${t('tasks.inSpot', { spot: task.spotLabel })}` : ''}
              </p>
              <p className="text-gate-sm text-ink-soft">
                <span data-stored-text="">{task.note}</span>{' '}
                {t('tasks.found', { when: formatTime(task.createdAt, tz, 'dateTime', locale) })}
              </p>
              {task.kind === 'low_fuel' ? (
                <Caution title={c('titles.fuelling')}>{c('fuelling')}</Caution>
              ) : null}
              <ActionForm
                action={clearTaskAction}
                submitLabel={t('tasks.clear')}
                pendingLabel={t('tasks.clearing')}
                variant="secondary"
                hidden={{ id: task.id }}
              />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
