import { useTranslations } from 'next-intl';
import { ActionForm } from '@/app/_components/action-form';
import { Textarea } from '@/app/_components/field';
import { disputeByLinkAction } from '../actions';

export function LinkDisputeForm({ token }: { token: string }) {
  const t = useTranslations('CaseLink');
  return (
    <ActionForm
      action={disputeByLinkAction}
      hidden={{ token }}
      ariaLabel={t('disputeTitle')}
      submitLabel={t('disputeSubmit')}
      pendingLabel={t('sending')}
      className="rounded-xl bg-paper p-3"
    >
      <Textarea label={t('note')} name="note" rows={4} required minLength={10} />
    </ActionForm>
  );
}
