import { useTranslations } from 'next-intl';
import { ActionForm } from '@/app/_components/action-form';
import { Field } from '@/app/_components/field';
import { releaseHoldAction } from '../../actions';

export function HoldReleaseForm({
  holdId,
  trailerId,
  reason,
  nowLocal,
}: {
  holdId: string;
  trailerId: string;
  reason: string;
  nowLocal: string;
}) {
  const t = useTranslations('Trailers');
  return (
    <ActionForm
      action={releaseHoldAction}
      hidden={{ holdId, trailerId }}
      submitLabel={t('release.submit')}
      ariaLabel={t('release.label', { reason })}
    >
      <Field
        label={t('release.repairedBy')}
        name="repairedBy"
        id={`repairedBy-${holdId}`}
        required
        hint={t('release.repairedByHint')}
      />
      <Field label={t('release.repairNote')} name="repairNote" id={`repairNote-${holdId}`} required />
      <Field
        label={t('release.repairedAt')}
        name="repairedAt"
        id={`repairedAt-${holdId}`}
        type="datetime-local"
        required
        defaultValue={nowLocal}
      />
    </ActionForm>
  );
}
