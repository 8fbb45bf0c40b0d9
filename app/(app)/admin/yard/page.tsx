import type { Metadata } from 'next';
import { useTranslations } from 'next-intl';
import { getTranslations } from 'next-intl/server';
import { ActionForm } from '@/app/_components/action-form';
import { EmptyState } from '@/app/_components/empty-state';
import { Field } from '@/app/_components/field';
import { listLayout } from '@/db/queries/yard-layout';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import {
  createRowAction,
  createSpotAction,
  renameRowAction,
  renameSpotAction,
  retireSpotAction,
} from './actions';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Admin'))('yard.title') };
}

type Spot = Awaited<ReturnType<typeof listLayout>>['spots'][number];

function SpotLine({ s }: { s: Spot }) {
  const t = useTranslations('Admin');
  if (s.retiredAt)
    return <li className="text-gate-sm text-ink-faint">{t('yard.retired', { label: s.label })}</li>;
  return (
    <li className="flex flex-wrap items-start gap-2 border-t border-paper-line pt-2">
      <ActionForm
        action={renameSpotAction}
        submitLabel={t('yard.rename')}
        variant="secondary"
        hidden={{ id: s.id }}
      >
        <Field
          id={`spot-${s.id}-name`}
          name="name"
          label={t('yard.labelOf', { label: s.label })}
          defaultValue={s.label}
        />
      </ActionForm>
      <span className="py-3 text-gate-sm">
        {s.occupant ? t('yard.holds', { unit: s.occupant }) : t('yard.empty')}
      </span>
      <ActionForm
        action={retireSpotAction}
        submitLabel={t('yard.retire', { label: s.label })}
        pendingLabel={t('yard.retiring')}
        variant="danger"
        hidden={{ id: s.id }}
      />
    </li>
  );
}

function AddSpot({ kind, rowId, name }: { kind: 'slot' | 'door'; rowId?: string; name: string }) {
  const t = useTranslations('Admin');
  return (
    <ActionForm
      action={createSpotAction}
      submitLabel={kind === 'door' ? t('yard.addDoor') : t('yard.addSlot')}
      hidden={{ kind, ...(rowId ? { rowId } : {}) }}
    >
      <Field
        id={`new-${kind}-${rowId ?? 'doors'}-label`}
        name="label"
        required
        label={kind === 'door' ? t('yard.newDoor', { name }) : t('yard.newSlot', { name })}
      />
    </ActionForm>
  );
}

export default async function YardLayoutPage() {
  const user = await requireUser(SECTION_ROLES.admin);
  const t = await getTranslations('Admin');
  if (!user.terminalId) return <EmptyState title={t('yard.noTerminal')}>{t('yard.setTerminal')}</EmptyState>;
  const { rows, spots } = await listLayout(user.terminalId);
  const doors = spots.filter((s) => s.kind === 'door');
  return (
    <div className="space-y-4">
      <h1 className="text-gate-xl font-bold">{t('yard.heading', { terminal: user.terminalName ?? '' })}</h1>
      <p className="text-gate">{t('yard.intro')}</p>
      <section aria-labelledby="add-row" className="rounded-xl bg-paper p-3 shadow">
        <h2 id="add-row" className="text-gate-lg font-bold">
          {t('yard.addRow')}
        </h2>
        <ActionForm action={createRowAction} submitLabel={t('yard.addRowSubmit')}>
          <Field id="new-row-name" name="name" required label={t('yard.newRow')} />
        </ActionForm>
      </section>
      {rows.map((r) => {
        const own = spots.filter((s) => s.rowId === r.id);
        return (
          <details key={r.id} className="rounded-xl bg-paper p-3 shadow">
            <summary className="min-h-tap cursor-pointer py-2 text-gate-lg font-bold">
              {r.name} · {t('yard.slots', { count: own.filter((s) => !s.retiredAt).length })}
            </summary>
            <ActionForm
              action={renameRowAction}
              submitLabel={t('yard.renameRow')}
              variant="secondary"
              hidden={{ id: r.id }}
            >
              <Field
                id={`row-${r.id}-name`}
                name="name"
                label={t('yard.nameOf', { name: r.name })}
                defaultValue={r.name}
              />
            </ActionForm>
            <ul className="mt-2 space-y-2">
              {own.map((s) => (
                <SpotLine key={s.id} s={s} />
              ))}
            </ul>
            <AddSpot kind="slot" rowId={r.id} name={r.name} />
          </details>
        );
      })}
      <details className="rounded-xl bg-paper p-3 shadow">
        <summary className="min-h-tap cursor-pointer py-2 text-gate-lg font-bold">
          {t('yard.doors', { count: doors.filter((d) => !d.retiredAt).length })}
        </summary>
        <ul className="mt-2 space-y-2">
          {doors.map((s) => (
            <SpotLine key={s.id} s={s} />
          ))}
        </ul>
        <AddSpot kind="door" name={t('yard.doorsName')} />
      </details>
    </div>
  );
}
