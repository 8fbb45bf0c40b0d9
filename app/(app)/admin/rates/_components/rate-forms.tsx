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
      className="grid gap-2 rounded-xl bg-paper p-3 sm:grid-cols-3 sm:items-start"
    >
      <Field label="Item key or prefix" name="itemPattern" required placeholder="rear.door_left" />
      <Select label="Condition" name="condition">
        {RATE_CONDITIONS.map((c) => (
          <option key={c}>{c}</option>
        ))}
      </Select>
      <Field label="Amount ($)" name="amount" inputMode="decimal" required />
    </ActionForm>
  );
}

export function ChangeRateForm({ id, label, amount }: { id: string; label: string; amount: string }) {
  return (
    <ActionForm
      action={changeRateAction}
      hidden={{ id }}
      ariaLabel={`Change ${label}`}
      submitLabel="Save"
      variant="secondary"
    >
      <Field
        label="Amount ($)"
        name="amount"
        id={`amount-${id}`}
        defaultValue={amount}
        inputMode="decimal"
        required
      />
    </ActionForm>
  );
}
