import { Field, Select } from '@/app/_components/field';
import { CASE_STATES } from '@/lib/desk/case-state';

type Props = {
  carriers: { id: string; scac: string; name: string }[];
  values: Record<string, string | undefined>;
  errors: Record<string, string[] | undefined>;
};

/** The queue's filters as a plain GET form, so a filtered queue is a link a clerk can share. */
export function QueueFilters({ carriers, values, errors }: Props) {
  return (
    <form
      method="get"
      className="grid grid-cols-2 gap-3 rounded-xl bg-paper p-3 sm:grid-cols-6"
      aria-label="Filter cases"
    >
      <Select label="State" name="state" defaultValue={values.state ?? ''} error={errors.state}>
        <option value="">Any</option>
        {CASE_STATES.map((s) => (
          <option key={s}>{s}</option>
        ))}
      </Select>
      <Select label="Carrier" name="carrier" defaultValue={values.carrier ?? ''} error={errors.carrier}>
        <option value="">Any</option>
        {carriers.map((c) => (
          <option key={c.id} value={c.id}>
            {c.scac}
          </option>
        ))}
      </Select>
      <Select
        label="Open for"
        name="olderThanDays"
        defaultValue={values.olderThanDays ?? ''}
        error={errors.olderThanDays}
      >
        <option value="">Any age</option>
        <option value="7">7+ days</option>
        <option value="30">30+ days</option>
        <option value="90">90+ days</option>
      </Select>
      <Field
        label="From $"
        name="minAmount"
        inputMode="decimal"
        defaultValue={values.minAmount ?? ''}
        error={errors.minAmount}
      />
      <Field
        label="To $"
        name="maxAmount"
        inputMode="decimal"
        defaultValue={values.maxAmount ?? ''}
        error={errors.maxAmount}
      />
      <Select label="Sort" name="sort" defaultValue={values.sort ?? 'oldest'} error={errors.sort}>
        <option value="oldest">Oldest first</option>
        <option value="newest">Newest first</option>
        <option value="amount_high">Largest amount</option>
        <option value="amount_low">Smallest amount</option>
      </Select>
      <div className="col-span-2 flex gap-2 sm:col-span-6">
        <button type="submit" className="min-h-tap rounded-lg bg-brand px-5 text-gate font-bold text-on-fill">
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
