import type { Metadata } from 'next';
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

export const metadata: Metadata = { title: 'Yard layout' };

type Spot = Awaited<ReturnType<typeof listLayout>>['spots'][number];

function SpotLine({ s }: { s: Spot }) {
  if (s.retiredAt) return <li className="text-gate-sm text-ink-faint">{s.label} · retired</li>;
  return (
    <li className="flex flex-wrap items-start gap-2 border-t border-paper-line pt-2">
      <ActionForm action={renameSpotAction} submitLabel="Rename" variant="secondary" hidden={{ id: s.id }}>
        <Field id={`spot-${s.id}-name`} name="name" label={`Label of ${s.label}`} defaultValue={s.label} />
      </ActionForm>
      <span className="py-3 text-gate-sm">{s.occupant ? `holds ${s.occupant}` : 'empty'}</span>
      <ActionForm
        action={retireSpotAction}
        submitLabel={`Retire ${s.label}`}
        pendingLabel="Retiring…"
        variant="danger"
        hidden={{ id: s.id }}
      />
    </li>
  );
}

function AddSpot({ kind, rowId, name }: { kind: 'slot' | 'door'; rowId?: string; name: string }) {
  return (
    <ActionForm
      action={createSpotAction}
      submitLabel={kind === 'door' ? 'Add door' : 'Add slot'}
      hidden={{ kind, ...(rowId ? { rowId } : {}) }}
    >
      <Field
        id={`new-${kind}-${rowId ?? 'doors'}-label`}
        name="label"
        required
        label={`New ${kind} label in ${name}`}
      />
    </ActionForm>
  );
}

export default async function YardLayoutPage() {
  const user = await requireUser(SECTION_ROLES.admin);
  if (!user.terminalId)
    return <EmptyState title="No home terminal">Set your home terminal first.</EmptyState>;
  const { rows, spots } = await listLayout(user.terminalId);
  const doors = spots.filter((s) => s.kind === 'door');
  return (
    <div className="space-y-4">
      <h1 className="text-gate-xl font-bold">Yard layout · {user.terminalName}</h1>
      <p className="text-gate">
        A slot or door that holds a trailer can be retired only after the trailer is moved out.
      </p>
      <section aria-labelledby="add-row" className="rounded-xl bg-paper p-3 shadow">
        <h2 id="add-row" className="text-gate-lg font-bold">
          Add a row
        </h2>
        <ActionForm action={createRowAction} submitLabel="Add row">
          <Field id="new-row-name" name="name" required label="New row name" />
        </ActionForm>
      </section>
      {rows.map((r) => {
        const own = spots.filter((s) => s.rowId === r.id);
        return (
          <details key={r.id} className="rounded-xl bg-paper p-3 shadow">
            <summary className="min-h-tap cursor-pointer py-2 text-gate-lg font-bold">
              {r.name} · {own.filter((s) => !s.retiredAt).length} slots
            </summary>
            <ActionForm
              action={renameRowAction}
              submitLabel="Rename row"
              variant="secondary"
              hidden={{ id: r.id }}
            >
              <Field id={`row-${r.id}-name`} name="name" label={`Name of ${r.name}`} defaultValue={r.name} />
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
          Dock doors · {doors.filter((d) => !d.retiredAt).length}
        </summary>
        <ul className="mt-2 space-y-2">
          {doors.map((s) => (
            <SpotLine key={s.id} s={s} />
          ))}
        </ul>
        <AddSpot kind="door" name="dock doors" />
      </details>
    </div>
  );
}
