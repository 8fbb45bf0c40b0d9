'use client';

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
  return (
    <section aria-labelledby="who-title" className="space-y-2">
      <h2 id="who-title" className="text-gate-xl font-bold">
        Driver and tractor
      </h2>
      {isDriver ? (
        <>
          <p className="text-gate">
            Carrier: <span className="font-bold">{carrierName}</span>
          </p>
          <FieldError id="carrierId-error" messages={errors.carrierId} />
        </>
      ) : (
        <Select
          label="Carrier"
          name="carrierId"
          value={draft.carrierId}
          onChange={(e) => set({ carrierId: e.target.value })}
          error={errors.carrierId}
        >
          <option value="">Choose the carrier</option>
          {carriers.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name} ({c.scac})
            </option>
          ))}
        </Select>
      )}
      <Field
        label="Driver name"
        name="driverName"
        value={draft.driverName}
        onChange={(e) => set({ driverName: e.target.value })}
        autoComplete="name"
        maxLength={L.driverName}
        error={errors.driverName}
      />
      <Field
        label="Tractor number"
        name="tractorNumber"
        value={draft.tractorNumber}
        onChange={(e) => set({ tractorNumber: e.target.value })}
        maxLength={L.tractorNumber}
        autoCapitalize="characters"
        error={errors.tractorNumber}
      />
      <Choice
        label="Loaded or empty?"
        columns={2}
        value={draft.isLoaded}
        onChange={(v) => set({ isLoaded: v })}
        options={[
          { value: true, label: 'Loaded' },
          { value: false, label: 'Empty' },
        ]}
      />
      <FieldError id="isLoaded-error" messages={errors.isLoaded} />
      <Field
        label="Seal number"
        name="sealNumber"
        value={draft.sealNumber}
        onChange={(e) => set({ sealNumber: e.target.value })}
        maxLength={L.sealNumber}
        autoCapitalize="characters"
        error={errors.sealNumber}
      />
    </section>
  );
}
