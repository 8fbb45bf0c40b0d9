import { useTranslations } from 'next-intl';
import { ActionForm } from '@/app/_components/action-form';
import { Field, Select } from '@/app/_components/field';
import { RATE_CONDITIONS } from '@/lib/validation/desk';
import { addRateAction, changeRateAction } from '../actions';

export function AddRateForm() {
  const t = useTranslations('Admin');
  return (
    <ActionForm
      action={addRateAction}
      ariaLabel={t('rates.add')}
      submitLabel={t('rates.addSubmit')}
      className="rounded-xl bg-paper p-3"
    >
      <div className="grid gap-2 sm:grid-cols-3">
        <Field label={t('rates.pattern')} name="itemPattern" required placeholder="rear.door_left" />
        <Select label={t('rates.condition')} name="condition">
          {RATE_CONDITIONS.map((c) => (
            <option key={c}>{c}</option>
          ))}
        </Select>
        <Field label={t('rates.amount')} name="amount" inputMode="decimal" required />
      </div>
    </ActionForm>
  );
}

/** One rate's amount and its Save button on one line; the row beside it names the rate. */
export function ChangeRateForm({ id, label, amount }: { id: string; label: string; amount: string }) {
  const t = useTranslations('Admin');
  return (
    <ActionForm
      action={changeRateAction}
      hidden={{ id }}
      ariaLabel={t('rates.change', { label })}
      submitLabel={t('rates.save')}
      variant="secondary"
      className="flex flex-wrap items-start gap-x-2"
    >
      <Field
        label={t('rates.amountFor', { label })}
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
