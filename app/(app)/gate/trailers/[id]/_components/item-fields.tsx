'use client';

import { useTranslations } from 'next-intl';
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
  const t = useTranslations('Handoff.fields');
  switch (kind) {
    case 'pin':
      return (
        <Choice
          label={t('engagedQuestion', { item: label })}
          options={YES_NO(t('engaged'), t('notEngaged'))}
          value={value.isEngaged}
          onChange={(v) => set({ isEngaged: v })}
          columns={2}
        />
      );
    case 'spare':
      return (
        <>
          <Choice
            label={t('mountedQuestion')}
            options={YES_NO(t('mounted'), t('notMounted'))}
            value={value.isMounted}
            onChange={(v) => set({ isMounted: v })}
            columns={2}
          />
          <Choice
            label={t('airQuestion')}
            options={YES_NO(t('holdsAir'), t('flat'))}
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
            {t('tread')}
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
            label={t('airQuestion')}
            options={YES_NO(t('holdsAir'), t('flat'))}
            value={value.isHoldingAir}
            onChange={(v) => set({ isHoldingAir: v })}
            columns={2}
          />
        </div>
      );
    case 'hinge':
      return (
        <Choice
          label={t('lockQuestion')}
          options={YES_NO(t('locks'), t('doesNotLock'), 'warn')}
          value={value.isLocking}
          onChange={(v) => set({ isLocking: v })}
          columns={2}
        />
      );
    case 'skin':
      return (
        <Choice
          label={t('insulationQuestion')}
          options={[
            { value: false, label: t('insulationNo'), tone: 'ok' },
            { value: true, label: t('insulationYes'), tone: 'danger' },
          ]}
          value={value.isInsulationShowing}
          onChange={(v) => set({ isInsulationShowing: v })}
          columns={2}
        />
      );
    case 'leak':
      return (
        <Choice
          label={t('leakQuestion')}
          options={[
            { value: false, label: t('noLeak'), tone: 'ok' },
            { value: true, label: t('leaking'), tone: 'danger' },
          ]}
          value={value.isLeaking}
          onChange={(v) => set({ isLeaking: v })}
          columns={2}
        />
      );
    case 'cleanliness':
      return (
        <Choice
          label={t('inside')}
          options={[
            { value: 'clean', label: t('clean'), tone: 'ok' },
            { value: 'sweep', label: t('sweep'), tone: 'warn' },
            { value: 'washout', label: t('washout'), tone: 'warn' },
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
