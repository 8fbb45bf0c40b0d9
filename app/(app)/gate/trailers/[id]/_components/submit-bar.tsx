import { useTranslations } from 'next-intl';
import { Button } from '@/app/_components/button';
import { Caution } from '@/app/_components/caution';
import { FormError } from '@/app/_components/field';
import type { SubmitRefusal, SubmitStatus } from './use-submit';

/** The foot of the form, always in reach: what happened to the last submit, and the button. */
export function SubmitBar({
  kind,
  status,
  refusal,
}: {
  kind: 'drop' | 'hook';
  status: SubmitStatus;
  refusal: SubmitRefusal | null;
}) {
  const t = useTranslations('Handoff.confirm');
  return (
    <div className="sticky bottom-0 space-y-2 border-t-2 border-paper-line bg-paper py-2">
      {status === 'queued' || status === 'behindPhoto' ? (
        <p role="status" className="rounded-lg bg-warn-bg p-3 text-gate font-bold text-warn">
          {t(status)}
        </p>
      ) : null}
      {refusal ? (
        <div role="alert" className="space-y-1">
          <FormError message={refusal.message} />
          {refusal.holds?.length ? (
            <ul className="list-disc pl-6 text-gate text-danger">
              {refusal.holds.map((h) => (
                <li key={h.reason}>{h.reason}</li>
              ))}
            </ul>
          ) : null}
          {refusal.cautions?.map((c) => (
            <Caution key={c}>{c}</Caution>
          ))}
        </div>
      ) : null}
      <Button type="submit" className="w-full min-h-tap-lg text-gate-lg" disabled={status === 'sending'}>
        {status === 'sending' ? t('sending') : t('record', { kind })}
      </Button>
    </div>
  );
}
