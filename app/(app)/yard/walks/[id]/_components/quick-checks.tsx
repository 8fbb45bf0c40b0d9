import { Field, Select } from '@/app/_components/field';
import type { QuickChecks } from '@/lib/yard/walk';

const YES_NO = [
  ['', 'Not checked'],
  ['yes', 'Yes'],
  ['no', 'No'],
] as const;

function YesNo({ name, label }: { name: string; label: string }) {
  return (
    <Select name={name} label={label} defaultValue="">
      {YES_NO.map(([v, l]) => (
        <option key={v} value={v}>
          {l}
        </option>
      ))}
    </Select>
  );
}

/** The walk's quick checks; every one may stay "not checked" (never read as ok). */
export function QuickCheckFields() {
  return (
    <fieldset className="grid grid-cols-2 gap-2 sm:grid-cols-5">
      <legend className="text-gate font-bold">Quick checks</legend>
      <YesNo name="isUnitRunning" label="Unit running" />
      <Field
        name="setpointF"
        label="Setpoint °F"
        type="number"
        step="0.1"
        min="-40"
        max="90"
        inputMode="decimal"
      />
      <Select name="fuelEighths" label="Fuel (eighths)" defaultValue="">
        <option value="">Not read</option>
        {Array.from({ length: 9 }, (_, i) => (
          <option key={i} value={i}>
            {i}/8
          </option>
        ))}
      </Select>
      <YesNo name="areDoorsClosed" label="Doors closed" />
      <YesNo name="isSealPresent" label="Seal present" />
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
