'use client';

import { useTranslations } from 'next-intl';
import { FieldError } from '@/app/_components/field';
import { useFieldError } from '@/app/_components/form-state';

/** The rows a walk covers, as checkboxes; inside an ActionForm its message shows under the boxes. */
export function RowChoice({ rows }: { rows: { id: string; name: string }[] }) {
  const t = useTranslations('Walk');
  const messages = useFieldError('rowIds');
  return (
    <fieldset
      className="w-full"
      aria-invalid={messages?.length ? true : undefined}
      aria-describedby={messages?.length ? 'rowIds-error' : undefined}
    >
      <legend className="text-gate font-bold">{t('rows')}</legend>
      <div className="mt-1 flex flex-wrap gap-2">
        {rows.map((r) => (
          <label
            key={r.id}
            className="flex min-h-tap items-center gap-2 rounded-lg border-2 border-paper-line px-3 text-gate"
          >
            <input type="checkbox" name="rowIds" value={r.id} className="size-5" /> {r.name}
          </label>
        ))}
      </div>
      <FieldError id="rowIds-error" messages={messages} />
    </fieldset>
  );
}
