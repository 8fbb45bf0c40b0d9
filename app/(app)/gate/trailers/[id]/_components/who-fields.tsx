'use client';

import type { Draft } from '@/lib/handoffs/draft';
import { Choice } from './choice';

const input = 'mt-1 block min-h-tap w-full rounded-lg border-2 border-paper-line px-3 text-gate';
const Err = ({ m }: { m?: string[] }) => (
  <p aria-live="polite" className="min-h-6 text-gate-sm font-bold text-danger">
    {m?.[0] ?? ''}
  </p>
);

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
        <p className="text-gate">
          Carrier: <span className="font-bold">{carrierName}</span>
        </p>
      ) : (
        <label className="block text-gate font-bold">
          Carrier
          <select
            value={draft.carrierId}
            onChange={(e) => set({ carrierId: e.target.value })}
            className={input}
          >
            <option value="">Choose the carrier</option>
            {carriers.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name} ({c.scac})
              </option>
            ))}
          </select>
        </label>
      )}
      <Err m={errors.carrierId} />
      <label className="block text-gate font-bold">
        Driver name
        <input
          value={draft.driverName}
          onChange={(e) => set({ driverName: e.target.value })}
          autoComplete="name"
          className={input}
        />
      </label>
      <Err m={errors.driverName} />
      <label className="block text-gate font-bold">
        Tractor number
        <input
          value={draft.tractorNumber}
          onChange={(e) => set({ tractorNumber: e.target.value })}
          autoCapitalize="characters"
          className={input}
        />
      </label>
      <Err m={errors.tractorNumber} />
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
      <Err m={errors.isLoaded} />
      <label className="block text-gate font-bold">
        Seal number
        <input
          value={draft.sealNumber}
          onChange={(e) => set({ sealNumber: e.target.value })}
          autoCapitalize="characters"
          className={input}
        />
      </label>
      <Err m={errors.sealNumber} />
    </section>
  );
}
