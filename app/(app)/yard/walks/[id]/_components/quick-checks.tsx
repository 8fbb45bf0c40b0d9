import { useTranslations } from 'next-intl';
import { Field, Select } from '@/app/_components/field';
import type { QuickChecks } from '@/lib/yard/walk';

const YES_NO = [
  ['', 'notChecked'],
  ['yes', 'yes'],
  ['no', 'no'],
] as const;

function YesNo({ name, label }: { name: string; label: string }) {
  const t = useTranslations('Walk');
  return (
    <Select name={name} label={label} defaultValue="">
      {YES_NO.map(([v, l]) => (
        <option key={v} value={v}>
          {t(`checks.${l}`)}
        </option>
      ))}
    </Select>
  );
}

/** The walk's quick checks; every one may stay "not checked" (never read as ok). */
export function QuickCheckFields() {
  const t = useTranslations('Walk');
  return (
    <fieldset className="grid grid-cols-2 gap-2 sm:grid-cols-5">
      <legend className="text-gate font-bold">{t('checks.title')}</legend>
      <YesNo name="isUnitRunning" label={t('checks.unitRunning')} />
      <Field
        name="setpointF"
        label={t('checks.setpoint')}
        type="number"
        step="0.1"
        min="-40"
        max="90"
        inputMode="decimal"
      />
      <Select name="fuelEighths" label={t('checks.fuel')} defaultValue="">
        <option value="">{t('checks.notRead')}</option>
        {Array.from({ length: 9 }, (_, i) => (
          <option key={i} value={i}>
            {i}/8
          </option>
        ))}
      </Select>
      <YesNo name="areDoorsClosed" label={t('checks.doorsClosed')} />
      <YesNo name="isSealPresent" label={t('checks.sealPresent')} />
    </fieldset>
  );
}

const yesNo = (v: FormDataEntryValue | null) => (v === 'yes' ? true : v === 'no' ? false : null);

/** Reads the quick checks out of the form; the server's zod schema has the final word on ranges. */
export function readQuickChecks(data: FormData): QuickChecks {
  const setpoint = String(data.get('setpointF') ?? '').trim();
  const fuel = String(data.get('fuelEighths') ?? '');
  return {
    isUnitRunning: yesNo(data.get('isUnitRunning')),
    setpointTenthsF:
      setpoint === '' || Number.isNaN(Number(setpoint)) ? null : Math.round(Number(setpoint) * 10),
    fuelEighths: fuel === '' ? null : Number(fuel),
    areDoorsClosed: yesNo(data.get('areDoorsClosed')),
    isSealPresent: yesNo(data.get('isSealPresent')),
  };
}
