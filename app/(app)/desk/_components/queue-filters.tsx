import { useTranslations } from 'next-intl';
import { Field, Select } from '@/app/_components/field';
import { CASE_STATES } from '@/lib/desk/case-state';

type Props = {
  carriers: { id: string; scac: string; name: string }[];
  values: Record<string, string | undefined>;
  errors: Record<string, string[] | undefined>;
};

/** The queue's filters as a plain GET form, so a filtered queue is a link a clerk can share. */
export function QueueFilters({ carriers, values, errors }: Props) {
  const t = useTranslations('Desk');
  return (
    <form
      method="get"
      className="grid grid-cols-2 gap-3 rounded-xl bg-paper p-3 sm:grid-cols-6"
      aria-label={t('filters.label')}
    >
      <Select label={t('filters.state')} name="state" defaultValue={values.state ?? ''} error={errors.state}>
        <option value="">{t('filters.any')}</option>
        {CASE_STATES.map((s) => (
          <option key={s} value={s}>
            {t(`state.${s}`)}
          </option>
        ))}
      </Select>
      <Select
        label={t('filters.carrier')}
        name="carrier"
        defaultValue={values.carrier ?? ''}
        error={errors.carrier}
      >
        <option value="">{t('filters.any')}</option>
        {carriers.map((c) => (
          <option key={c.id} value={c.id}>
            {c.scac}
          </option>
        ))}
      </Select>
      <Select
        label={t('filters.openFor')}
        name="olderThanDays"
        defaultValue={values.olderThanDays ?? ''}
        error={errors.olderThanDays}
      >
        <option value="">{t('filters.anyAge')}</option>
        {[7, 30, 90].map((days) => (
          <option key={days} value={days}>
            {t('filters.days', { days })}
          </option>
        ))}
      </Select>
      <Field
        label={t('filters.from')}
        name="minAmount"
        inputMode="decimal"
        defaultValue={values.minAmount ?? ''}
        error={errors.minAmount}
      />
      <Field
        label={t('filters.to')}
        name="maxAmount"
        inputMode="decimal"
        defaultValue={values.maxAmount ?? ''}
        error={errors.maxAmount}
      />
      <Select
        label={t('filters.sort')}
        name="sort"
        defaultValue={values.sort ?? 'oldest'}
        error={errors.sort}
      >
        <option value="oldest">{t('filters.oldest')}</option>
        <option value="newest">{t('filters.newest')}</option>
        <option value="amount_high">{t('filters.amountHigh')}</option>
        <option value="amount_low">{t('filters.amountLow')}</option>
      </Select>
      <div className="col-span-2 flex gap-2 sm:col-span-6">
        <button type="submit" className="min-h-tap rounded-lg bg-brand px-5 text-gate font-bold text-on-fill">
          {t('filters.show')}
        </button>
        <a
          href="/desk"
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
        >
          {t('filters.clear')}
        </a>
      </div>
    </form>
  );
}
