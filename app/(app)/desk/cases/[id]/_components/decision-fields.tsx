'use client';

import { useTranslations } from 'next-intl';
import { FieldError } from '@/app/_components/field';
import { useFieldError, useTypedValue } from '@/app/_components/form-state';
import type { Decision } from '@/lib/desk/case-state';

/** The decision as radio buttons, with its message under the group and the choice kept after a refusal. */
export function DecisionFields({ choices }: { choices: readonly Decision[] }) {
  const t = useTranslations('Case');
  const messages = useFieldError('decision');
  const typed = useTypedValue('decision');
  return (
    <fieldset
      className="grid grid-cols-2 gap-2"
      aria-invalid={messages?.length ? true : undefined}
      aria-describedby={messages?.length ? 'decision-error' : undefined}
    >
      <legend className="text-gate font-bold">{t('actions.decision')}</legend>
      {choices.map((d) => (
        <label
          key={d}
          className="flex min-h-tap items-center gap-2 rounded-lg border-2 border-paper-line px-3 text-gate"
        >
          <input
            type="radio"
            name="decision"
            value={d}
            required
            defaultChecked={typed === d}
            className="h-5 w-5"
          />{' '}
          {t(`actions.decisionChoice.${d}`)}
        </label>
      ))}
      <FieldError id="decision-error" messages={messages} />
    </fieldset>
  );
}
