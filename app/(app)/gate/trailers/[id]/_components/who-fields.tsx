'use client';

import { useTranslations } from 'next-intl';
import { Field, FieldError, Select } from '@/app/_components/field';
import type { Draft } from '@/lib/handoffs/draft';
import { HANDOFF_LIMITS as L } from '@/lib/handoffs/limits';
import { Choice } from './choice';

export function WhoFields({
  draft,
  set,
  carriers,
  isDriver,
  carrierName,
  errors,
}: {
  draft: Draft;
  set: (p: Partial<Draft>) => void;
  carriers: { id: string; name: string; scac: string }[];
  isDriver: boolean;
  carrierName: string | null;
  errors: Record<string, string[]>;
}) {
  const t = useTranslations('Handoff.who');
  return (
    <div className="space-y-2">
      {isDriver ? (
        <>
          {/* a signed-in driver is recorded from the account: no name to type, no carrier to pick */}
          <p className="text-gate">
            {t('driver')} <span className="font-bold">{draft.driverName}</span>
          </p>
          <FieldError id="driverName-error" messages={errors.driverName} />
          <p className="text-gate">
            {t('carrier')} <span className="font-bold">{carrierName}</span>
          </p>
          <FieldError id="carrierId-error" messages={errors.carrierId} />
        </>
      ) : (
        <Select
          label={t('carrierLabel')}
          name="carrierId"
          value={draft.carrierId}
          onChange={(e) => set({ carrierId: e.target.value })}
          error={errors.carrierId}
        >
          <option value="">{t('chooseCarrier')}</option>
          {carriers.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name} ({c.scac})
            </option>
          ))}
        </Select>
      )}
      {isDriver ? null : (
        <Field
          label={t('driverName')}
          name="driverName"
          value={draft.driverName}
          onChange={(e) => set({ driverName: e.target.value })}
          autoComplete="name"
          maxLength={L.driverName}
          error={errors.driverName}
        />
      )}
      <Field
        label={t('tractor')}
        name="tractorNumber"
        value={draft.tractorNumber}
        onChange={(e) => set({ tractorNumber: e.target.value })}
        maxLength={L.tractorNumber}
        autoCapitalize="characters"
        error={errors.tractorNumber}
      />
      <Field
        label={t('seal')}
        name="sealNumber"
        value={draft.sealNumber}
        onChange={(e) => set({ sealNumber: e.target.value })}
        maxLength={L.sealNumber}
        autoCapitalize="characters"
        error={errors.sealNumber}
      />
      <Choice
        label={t('loadedQuestion')}
        columns={2}
        value={draft.isLoaded}
        onChange={(v) => set({ isLoaded: v })}
        errorId={errors.isLoaded?.length ? 'isLoaded-error' : undefined}
        options={[
          { value: true, label: t('loaded') },
          { value: false, label: t('empty') },
        ]}
      />
      <FieldError id="isLoaded-error" messages={errors.isLoaded} />
    </div>
  );
}
