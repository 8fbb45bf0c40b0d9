import type { QuickChecks } from '@/lib/yard/walk';

const YES_NO = [
  ['', 'Not checked'],
  ['yes', 'Yes'],
  ['no', 'No'],
] as const;
const select = 'mt-1 block min-h-tap w-full rounded-lg border-2 border-paper-line bg-paper px-2 text-gate';

function YesNo({ name, label }: { name: string; label: string }) {
  return (
    <label className="block text-gate-sm font-bold">
      {label}
      <select name={name} className={select} defaultValue="">
        {YES_NO.map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
    </label>
  );
}

/** The walk's quick checks; every one may stay "not checked" (never read as ok). */
export function QuickCheckFields() {
  return (
    <fieldset className="grid grid-cols-2 gap-2 sm:grid-cols-5">
      <legend className="text-gate font-bold">Quick checks</legend>
      <YesNo name="isUnitRunning" label="Unit running" />
      <label className="block text-gate-sm font-bold">
        Setpoint °F
        <input
          name="setpointF"
          type="number"
          step="0.1"
          min="-40"
          max="90"
          inputMode="decimal"
          className={select}
        />
      </label>
      <label className="block text-gate-sm font-bold">
        Fuel (eighths)
        <select name="fuelEighths" className={select} defaultValue="">
          <option value="">Not read</option>
          {Array.from({ length: 9 }, (_, i) => (
            <option key={i} value={i}>
              {i}/8
            </option>
          ))}
        </select>
      </label>
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
