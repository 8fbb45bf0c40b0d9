'use client';

import { useTranslations } from 'next-intl';
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
  const t = useTranslations('Handoff.fuel');
  return (
    <div className="space-y-1">
      <p className="text-gate-sm text-ink-soft">
        {last !== null && last !== undefined ? t('gaugeWithLast', { last }) : t('gauge')}
      </p>
      <Choice
        label={t('label')}
        hideLabel
        columns={3}
        value={value}
        onChange={onChange}
        errorId={error?.length ? 'fuelEighths-error' : undefined}
        options={Array.from({ length: 9 }, (_, n) => ({
          value: n,
          label: n === 8 ? t('full') : n === 0 ? t('empty') : `${n}/8`,
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
  const t = useTranslations('Handoff.reefer');
  const err = (k: string) => errors[`reefer.${k}`];
  const errorId = (k: string) => (err(k)?.length ? `${k}-error` : undefined);
  return (
    <div className="space-y-3">
      <Choice
        label={t('running')}
        options={YES_NO(t('on'), t('off'), 'warn')}
        value={reefer.isUnitOn}
        onChange={(v) => set({ isUnitOn: v })}
        columns={2}
        errorId={errorId('isUnitOn')}
      />
      <FieldError id="isUnitOn-error" messages={err('isUnitOn')} />
      <div className="grid grid-cols-2 gap-2">
        <Field
          label={t('setpoint')}
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
          label={t('returnAir')}
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
        label={t('engineHours')}
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
        label={t('preTripAt')}
        hint={t('preTripAtHint')}
        name="preTripAt"
        type="datetime-local"
        value={reefer.preTripAt}
        onChange={(e) => set({ preTripAt: e.target.value })}
        error={err('preTripAt')}
      />
      <Choice
        label={t('preTrip')}
        columns={3}
        value={reefer.preTripResult}
        onChange={(v) => set(v === 'not_run' ? { preTripResult: v, preTripAt: '' } : { preTripResult: v })}
        errorId={errorId('preTripResult')}
        options={[
          { value: 'pass', label: t('passed'), tone: 'ok' },
          { value: 'fail', label: t('failed'), tone: 'danger' },
          { value: 'not_run', label: t('notRun'), tone: 'warn' },
        ]}
      />
      <FieldError id="preTripResult-error" messages={err('preTripResult')} />
    </div>
  );
}
