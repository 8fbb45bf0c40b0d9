import { useTranslations } from 'next-intl';
import { ActionForm } from '@/app/_components/action-form';
import { reissueLabelAction } from '../actions';

/** Re-issue asks once more in words: the label on the trailer stops working at once. */
export function ReissueForm({ trailerId, unitNumber }: { trailerId: string; unitNumber: string }) {
  const t = useTranslations('Trailers');
  return (
    <section aria-labelledby="reissue-title" className="space-y-2 rounded-xl bg-paper p-4">
      <h2 id="reissue-title" className="text-gate-lg font-bold">
        {t('labels.reissueTitle')}
      </h2>
      <p className="text-gate">{t('labels.reissueText', { unit: unitNumber })}</p>
      <ActionForm
        action={reissueLabelAction}
        hidden={{ trailerId }}
        submitLabel={t('labels.reissue')}
        pendingLabel={t('labels.reissuing')}
        variant="danger"
      />
    </section>
  );
}
