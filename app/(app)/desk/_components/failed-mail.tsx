import { useLocale, useTranslations } from 'next-intl';
import { ActionForm } from '@/app/_components/action-form';
import { formatTime } from '@/lib/format/time';
import { resendEmailAction } from '../actions';

type Failed = {
  id: string;
  to: string;
  subject: string;
  attempts: number;
  lastError: string | null;
  createdAt: Date;
};

/** E-mail the job queue gave up on after its attempts, each with a resend button (desk staff only). */
export function FailedMail({ emails, timeZone }: { emails: Failed[]; timeZone: string }) {
  const t = useTranslations('Desk');
  const locale = useLocale();
  if (!emails.length) return null;
  return (
    <section
      aria-labelledby="failed-mail"
      className="space-y-2 rounded-xl border-2 border-danger bg-danger-bg p-3"
    >
      <h2 id="failed-mail" className="text-gate-lg font-bold text-danger">
        {t('mail.title', { count: emails.length })}
      </h2>
      <ul className="space-y-2">
        {emails.map((m) => (
          <li key={m.id} className="space-y-1 rounded-lg bg-paper p-3" data-email-id={m.id}>
            <p className="text-gate font-bold">{m.subject}</p>
            <p className="text-gate-sm">
              {t('mail.line', {
                to: m.to,
                when: formatTime(m.createdAt, timeZone, 'dateTime', locale),
                attempts: m.attempts,
              })}
            </p>
            {m.lastError ? <p className="font-mono text-gate-sm text-ink-soft">{m.lastError}</p> : null}
            <ActionForm
              action={resendEmailAction}
              hidden={{ emailId: m.id }}
              submitLabel={t('mail.resend')}
              pendingLabel={t('mail.queueing')}
              variant="secondary"
              ariaLabel={t('mail.resendLabel', { subject: m.subject, to: m.to })}
            />
          </li>
        ))}
      </ul>
    </section>
  );
}
