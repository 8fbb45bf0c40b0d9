import { CASE_STATES } from '@/lib/desk/case-state';

type Props = {
  carriers: { id: string; scac: string; name: string }[];
  values: Record<string, string | undefined>;
  errors: Record<string, string[] | undefined>;
};

const select = 'mt-1 block min-h-tap w-full rounded-lg border-2 border-paper-line bg-paper px-2 text-gate';

function Err({ name, errors }: { name: string; errors: Props['errors'] }) {
  const m = errors[name]?.[0];
  return m ? (
    <p id={`${name}-error`} className="text-gate-sm font-bold text-danger">
      {m}
    </p>
  ) : null;
}

/** The queue's filters as a plain GET form, so a filtered queue is a link a clerk can share. */
export function QueueFilters({ carriers, values, errors }: Props) {
  return (
    <form
      method="get"
      className="grid grid-cols-2 gap-3 rounded-xl bg-paper p-3 sm:grid-cols-6"
      aria-label="Filter cases"
    >
      <label className="text-gate-sm font-bold">
        State
        <select name="state" defaultValue={values.state ?? ''} className={select}>
          <option value="">Any</option>
          {CASE_STATES.map((s) => (
            <option key={s}>{s}</option>
          ))}
        </select>
        <Err name="state" errors={errors} />
      </label>
      <label className="text-gate-sm font-bold">
        Carrier
        <select name="carrier" defaultValue={values.carrier ?? ''} className={select}>
          <option value="">Any</option>
          {carriers.map((c) => (
            <option key={c.id} value={c.id}>
              {c.scac}
            </option>
          ))}
        </select>
        <Err name="carrier" errors={errors} />
      </label>
      <label className="text-gate-sm font-bold">
        Open for
        <select name="olderThanDays" defaultValue={values.olderThanDays ?? ''} className={select}>
          <option value="">Any age</option>
          <option value="7">7+ days</option>
          <option value="30">30+ days</option>
          <option value="90">90+ days</option>
        </select>
        <Err name="olderThanDays" errors={errors} />
      </label>
      <label className="text-gate-sm font-bold">
        From $
        <input
          name="minAmount"
          inputMode="decimal"
          defaultValue={values.minAmount ?? ''}
          className={select}
          aria-describedby="minAmount-error"
        />
        <Err name="minAmount" errors={errors} />
      </label>
      <label className="text-gate-sm font-bold">
        To $
        <input
          name="maxAmount"
          inputMode="decimal"
          defaultValue={values.maxAmount ?? ''}
          className={select}
          aria-describedby="maxAmount-error"
        />
        <Err name="maxAmount" errors={errors} />
      </label>
      <label className="text-gate-sm font-bold">
        Sort
        <select name="sort" defaultValue={values.sort ?? 'oldest'} className={select}>
          <option value="oldest">Oldest first</option>
          <option value="newest">Newest first</option>
          <option value="amount_high">Largest amount</option>
          <option value="amount_low">Smallest amount</option>
        </select>
      </label>
      <div className="col-span-2 flex gap-2 sm:col-span-6">
        <button type="submit" className="min-h-tap rounded-lg bg-brand px-5 text-gate font-bold text-white">
          Show cases
        </button>
        <a
          href="/desk"
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
        >
          Clear
        </a>
      </div>
    </form>
  );
}
