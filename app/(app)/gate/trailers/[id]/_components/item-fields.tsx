'use client';

import type { ItemKind } from '@/lib/engine';
import type { DraftItem } from '@/lib/handoffs/draft';
import { TREAD_LIMITS } from '@/lib/handoffs/limits';
import { Choice, YES_NO } from './choice';

/** The extra answers an item's kind asks for (OBSERVATION_FIELDS in the engine). */
export function ItemFields({
  kind,
  value,
  set,
  label,
}: {
  kind: ItemKind;
  value: DraftItem;
  set: (p: Partial<DraftItem>) => void;
  label: string;
}) {
  switch (kind) {
    case 'pin':
      return (
        <Choice
          label={`${label}: engaged?`}
          options={YES_NO('Engaged', 'Not engaged')}
          value={value.isEngaged}
          onChange={(v) => set({ isEngaged: v })}
          columns={2}
        />
      );
    case 'spare':
      return (
        <>
          <Choice
            label="On its wheel (mounted)?"
            options={YES_NO('Mounted', 'Not mounted')}
            value={value.isMounted}
            onChange={(v) => set({ isMounted: v })}
            columns={2}
          />
          <Choice
            label="Holding air?"
            options={YES_NO('Holds air', 'Flat')}
            value={value.isHoldingAir}
            onChange={(v) => set({ isHoldingAir: v })}
            columns={2}
          />
        </>
      );
    case 'tire':
      return (
        <div className="grid grid-cols-2 items-end gap-2">
          <label className="block text-gate font-bold">
            Tread (32nds in)
            <input
              type="number"
              inputMode="numeric"
              min={TREAD_LIMITS.min}
              max={TREAD_LIMITS.max}
              step={1}
              value={value.treadThirtySeconds ?? ''}
              onChange={(e) =>
                set({ treadThirtySeconds: e.target.value === '' ? undefined : Number(e.target.value) })
              }
              className="mt-1 block min-h-tap w-full rounded-lg border-2 border-paper-line px-3 text-gate"
            />
          </label>
          <Choice
            label="Holding air?"
            options={YES_NO('Holds air', 'Flat')}
            value={value.isHoldingAir}
            onChange={(v) => set({ isHoldingAir: v })}
            columns={2}
          />
        </div>
      );
    case 'hinge':
      return (
        <Choice
          label="Does it lock?"
          options={YES_NO('Locks', 'Does not lock', 'warn')}
          value={value.isLocking}
          onChange={(v) => set({ isLocking: v })}
          columns={2}
        />
      );
    case 'skin':
      return (
        <Choice
          label="Insulation showing?"
          options={[
            { value: false, label: 'No', tone: 'ok' },
            { value: true, label: 'Yes, showing', tone: 'danger' },
          ]}
          value={value.isInsulationShowing}
          onChange={(v) => set({ isInsulationShowing: v })}
          columns={2}
        />
      );
    case 'leak':
      return (
        <Choice
          label="Fuel leaking?"
          options={[
            { value: false, label: 'No leak', tone: 'ok' },
            { value: true, label: 'Leaking', tone: 'danger' },
          ]}
          value={value.isLeaking}
          onChange={(v) => set({ isLeaking: v })}
          columns={2}
        />
      );
    case 'cleanliness':
      return (
        <Choice
          label="Inside"
          options={[
            { value: 'clean', label: 'Clean', tone: 'ok' },
            { value: 'sweep', label: 'Sweep', tone: 'warn' },
            { value: 'washout', label: 'Washout', tone: 'warn' },
          ]}
          value={value.cleanliness}
          onChange={(v) => set({ cleanliness: v as DraftItem['cleanliness'] })}
          columns={3}
        />
      );
    default:
      return null;
  }
}
