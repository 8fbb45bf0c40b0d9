import type { Metadata } from 'next';
import { EmptyState } from '@/app/_components/empty-state';
import { listLayout } from '@/db/queries/yard-layout';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { ActionForm } from '../../yard/_components/action-form';
import {
  createRowAction,
  createSpotAction,
  renameRowAction,
  renameSpotAction,
  retireSpotAction,
} from './actions';

export const metadata: Metadata = { title: 'Yard layout' };

const input = 'min-h-tap rounded-lg border-2 border-paper-line bg-paper px-2 text-gate-sm';

type Spot = Awaited<ReturnType<typeof listLayout>>['spots'][number];

function SpotLine({ s }: { s: Spot }) {
  if (s.retiredAt) return <li className="text-gate-sm text-ink-faint">{s.label} · retired</li>;
  return (
    <li className="flex flex-wrap items-start gap-2 border-t border-paper-line pt-2">
      <ActionForm action={renameSpotAction} submitLabel="Rename" variant="secondary">
        <input type="hidden" name="id" value={s.id} />
        <input
          name="name"
          defaultValue={s.label}
          aria-label={`Label of ${s.label}`}
          className={`${input} w-28`}
        />
      </ActionForm>
      <span className="py-3 text-gate-sm">{s.occupant ? `holds ${s.occupant}` : 'empty'}</span>
      <ActionForm action={retireSpotAction} submitLabel={`Retire ${s.label}`} variant="danger">
        <input type="hidden" name="id" value={s.id} />
      </ActionForm>
    </li>
  );
}

function AddSpot({ kind, rowId, name }: { kind: 'slot' | 'door'; rowId?: string; name: string }) {
  return (
    <ActionForm action={createSpotAction} submitLabel={kind === 'door' ? 'Add door' : 'Add slot'}>
      <input type="hidden" name="kind" value={kind} />
      {rowId ? <input type="hidden" name="rowId" value={rowId} /> : null}
      <input
        name="label"
        required
        placeholder="Label"
        aria-label={`New ${kind} label in ${name}`}
        className={`${input} w-32`}
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
          <input name="name" required placeholder="Row name" aria-label="New row name" className={input} />
        </ActionForm>
      </section>
      {rows.map((r) => {
        const own = spots.filter((s) => s.rowId === r.id);
        return (
          <details key={r.id} className="rounded-xl bg-paper p-3 shadow">
            <summary className="min-h-tap cursor-pointer py-2 text-gate-lg font-bold">
              {r.name} · {own.filter((s) => !s.retiredAt).length} slots
            </summary>
            <ActionForm action={renameRowAction} submitLabel="Rename row" variant="secondary">
              <input type="hidden" name="id" value={r.id} />
              <input name="name" defaultValue={r.name} aria-label={`Name of ${r.name}`} className={input} />
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
