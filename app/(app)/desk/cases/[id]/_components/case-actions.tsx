import { useTranslations } from 'next-intl';
import { ActionForm } from '@/app/_components/action-form';
import { Field } from '@/app/_components/field';
import type { Role } from '@/lib/auth/roles';
import { isDeskStaff } from '@/lib/desk/access';
import { availableCommands, type CaseState } from '@/lib/desk/case-state';
import {
  closeCaseAction,
  decideCaseAction,
  disputeCaseAction,
  notifyCaseAction,
  overrideEstimateAction,
} from '../../../actions';
import { DecisionFields } from './decision-fields';
import { DisputeFields } from './dispute-fields';

type Props = {
  caseId: string;
  trailerId: string;
  itemKey: string;
  state: CaseState;
  role: Role;
  carrierEmail: string | null;
  amountDollars: string;
  isDisputeOpen: boolean;
};

const BOX = 'rounded-xl bg-paper p-3';

/** The commands this viewer may give in this state; the server checks again. */
export function CaseActions({
  caseId,
  trailerId,
  itemKey,
  state,
  role,
  carrierEmail,
  amountDollars,
  isDisputeOpen,
}: Props) {
  const t = useTranslations('Case');
  const can = new Set(availableCommands(state));
  const isStaff = isDeskStaff(role);
  const hidden = { caseId };
  const forms: React.ReactNode[] = [];
  if (can.has('dispute') && isDisputeOpen && (role === 'driver' || isStaff)) {
    forms.push(
      <ActionForm
        key="dispute"
        action={disputeCaseAction}
        hidden={hidden}
        title={t('actions.disputeTitle')}
        submitLabel={t('actions.disputeSubmit')}
        pendingLabel={t('actions.saving')}
        variant="danger"
        className={BOX}
      >
        <DisputeFields trailerId={trailerId} itemKey={itemKey} />
      </ActionForm>,
    );
  }
  if (!isStaff) return forms.length ? <div className="space-y-3">{forms}</div> : null;
  if (can.has('notify')) {
    forms.push(
      <ActionForm
        key="notify"
        action={notifyCaseAction}
        hidden={hidden}
        title={t('actions.notifyTitle')}
        submitLabel={t('actions.notifySubmit')}
        pendingLabel={t('actions.saving')}
        className={BOX}
      >
        <p className="text-gate-sm">
          {t('actions.notifyText', { to: carrierEmail ?? t('actions.theCarrier') })}
        </p>
      </ActionForm>,
    );
  }
  if (can.has('override')) {
    forms.push(
      <ActionForm
        key="override"
        action={overrideEstimateAction}
        hidden={hidden}
        title={t('actions.overrideTitle')}
        submitLabel={t('actions.overrideSubmit')}
        pendingLabel={t('actions.saving')}
        variant="secondary"
        className={BOX}
      >
        <Field
          label={t('actions.amount')}
          name="amount"
          id="override-amount"
          inputMode="decimal"
          required
          defaultValue={amountDollars}
        />
        <Field
          label={t('actions.reason')}
          name="reason"
          id="override-reason"
          required
          placeholder={t('actions.reasonExample')}
        />
      </ActionForm>,
    );
  }
  if (can.has('decide')) {
    const choices =
      state === 'open' ? (['absorb', 'waive'] as const) : (['charge', 'share', 'absorb', 'waive'] as const);
    forms.push(
      <ActionForm
        key="decide"
        action={decideCaseAction}
        hidden={hidden}
        title={t('actions.decideTitle')}
        submitLabel={t('actions.decideSubmit')}
        pendingLabel={t('actions.saving')}
        className={BOX}
      >
        <DecisionFields choices={choices} />
        <Field label={t('actions.charged')} name="amount" id="decide-amount" inputMode="decimal" />
        <Field label={t('actions.reason')} name="reason" id="decide-reason" required />
        {state === 'open' ? <p className="text-gate-sm text-ink-soft">{t('actions.notifyFirst')}</p> : null}
      </ActionForm>,
    );
  }
  if (can.has('close')) {
    forms.push(
      <ActionForm
        key="close"
        action={closeCaseAction}
        hidden={hidden}
        title={t('actions.closeTitle')}
        submitLabel={t('actions.closeSubmit')}
        pendingLabel={t('actions.saving')}
        variant="secondary"
        className={BOX}
      >
        <Field label={t('actions.note')} name="note" id="close-note" placeholder={t('actions.noteExample')} />
      </ActionForm>,
    );
  }
  return <div className="space-y-3">{forms}</div>;
}
