'use client';

import { Field, FieldError } from '@/app/_components/field';
import type { Draft } from '@/lib/handoffs/draft';
import { HANDOFF_LIMITS as L } from '@/lib/handoffs/limits';
import { Choice, YES_NO } from './choice';

export function FuelButtons({
  value,
  onChange,
  last,
  error,
}: {
  value: number | null;
  onChange: (v: number) => void;
  last: number | null | undefined;
  error?: string[];
}) {
  return (
    <div className="space-y-1">
      <p className="text-gate-sm text-ink-soft">
        Reefer tank gauge in eighths{last !== null && last !== undefined ? `; last record ${last}/8` : ''}.
      </p>
      <Choice
        label="Fuel in eighths"
        hideLabel
        columns={3}
        value={value}
        onChange={onChange}
        errorId={error?.length ? 'fuelEighths-error' : undefined}
        options={Array.from({ length: 9 }, (_, n) => ({
          value: n,
          label: n === 8 ? 'Full 8/8' : n === 0 ? 'Empty 0/8' : `${n}/8`,
          tone: n >= 8 ? 'ok' : n >= 4 ? 'warn' : 'danger',
        }))}
      />
      <FieldError id="fuelEighths-error" messages={error} />
    </div>
  );
}

/**
 * The reefer's readings. The typed values come first and the pre-trip result last, so the tap
 * that answers the step can also close it (the form moves on when a tap completes a step).
 */
export function ReeferFields({
  reefer,
  set,
  errors,
}: {
  reefer: Draft['reefer'];
  set: (p: Partial<Draft['reefer']>) => void;
  errors: Record<string, string[]>;
}) {
  const err = (k: string) => errors[`reefer.${k}`];
  const errorId = (k: string) => (err(k)?.length ? `${k}-error` : undefined);
  return (
    <div className="space-y-3">
      <Choice
        label="Unit running?"
        options={YES_NO('Running', 'Off', 'warn')}
        value={reefer.isUnitOn}
        onChange={(v) => set({ isUnitOn: v })}
        columns={2}
        errorId={errorId('isUnitOn')}
      />
      <FieldError id="isUnitOn-error" messages={err('isUnitOn')} />
      <div className="grid grid-cols-2 gap-2">
        <Field
          label="Setpoint °F"
          name="setpointF"
          type="number"
          inputMode="decimal"
          step="any"
          min={L.setpointF.min}
          max={L.setpointF.max}
          value={reefer.setpointF}
          onChange={(e) => set({ setpointF: e.target.value })}
          error={err('setpointF')}
        />
        <Field
          label="Return air °F"
          name="returnAirF"
          type="number"
          inputMode="decimal"
          step="any"
          min={L.returnAirF.min}
          max={L.returnAirF.max}
          value={reefer.returnAirF}
          onChange={(e) => set({ returnAirF: e.target.value })}
          error={err('returnAirF')}
        />
      </div>
      <Field
        label="Engine hours"
        name="engineHours"
        type="number"
        inputMode="decimal"
        step="any"
        min={L.engineHours.min}
        max={L.engineHours.max}
        value={reefer.engineHours}
        onChange={(e) => set({ engineHours: e.target.value })}
        error={err('engineHours')}
      />
      <Field
        label="When was the last pre-trip run?"
        hint="Leave empty if it was not run."
        name="preTripAt"
        type="datetime-local"
        value={reefer.preTripAt}
        onChange={(e) => set({ preTripAt: e.target.value })}
        error={err('preTripAt')}
      />
      <Choice
        label="Last pre-trip"
        columns={3}
        value={reefer.preTripResult}
        onChange={(v) => set(v === 'not_run' ? { preTripResult: v, preTripAt: '' } : { preTripResult: v })}
        errorId={errorId('preTripResult')}
        options={[
          { value: 'pass', label: 'Passed', tone: 'ok' },
          { value: 'fail', label: 'Failed', tone: 'danger' },
          { value: 'not_run', label: 'Not run', tone: 'warn' },
        ]}
      />
      <FieldError id="preTripResult-error" messages={err('preTripResult')} />
    </div>
  );
}
