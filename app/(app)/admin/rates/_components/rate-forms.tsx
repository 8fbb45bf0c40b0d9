import { ActionForm } from '@/app/_components/action-form';
import { Field, Select } from '@/app/_components/field';
import { RATE_CONDITIONS } from '@/lib/validation/desk';
import { addRateAction, changeRateAction } from '../actions';

export function AddRateForm() {
  return (
    <ActionForm
      action={addRateAction}
      ariaLabel="Add a rate"
      submitLabel="Add rate"
      className="rounded-xl bg-paper p-3"
    >
      <div className="grid gap-2 sm:grid-cols-3">
        <Field label="Item key or prefix" name="itemPattern" required placeholder="rear.door_left" />
        <Select label="Condition" name="condition">
          {RATE_CONDITIONS.map((c) => (
            <option key={c}>{c}</option>
          ))}
        </Select>
        <Field label="Amount ($)" name="amount" inputMode="decimal" required />
      </div>
    </ActionForm>
  );
}

/** One rate's amount and its Save button on one line; the row beside it names the rate. */
export function ChangeRateForm({ id, label, amount }: { id: string; label: string; amount: string }) {
  return (
    <ActionForm
      action={changeRateAction}
      hidden={{ id }}
      ariaLabel={`Change ${label}`}
      submitLabel="Save"
      variant="secondary"
      className="flex flex-wrap items-start gap-x-2"
    >
      <Field
        label={`Amount for ${label} ($)`}
        name="amount"
        id={`amount-${id}`}
        defaultValue={amount}
        inputMode="decimal"
        required
        className="w-32 [&>label]:sr-only [&>input]:mt-0"
      />
    </ActionForm>
  );
}
