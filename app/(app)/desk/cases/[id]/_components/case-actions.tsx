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
        title="Dispute this case"
        submitLabel="Send dispute"
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
        title="Notify the carrier"
        submitLabel="Notify carrier"
        className={BOX}
      >
        <p className="text-gate-sm">
          E-mails {carrierEmail ?? 'the carrier'} the evidence summary and a signed link to dispute.
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
        title="Change the estimate"
        submitLabel="Save estimate"
        variant="secondary"
        className={BOX}
      >
        <Field
          label="Amount ($)"
          name="amount"
          id="override-amount"
          inputMode="decimal"
          required
          defaultValue={amountDollars}
        />
        <Field
          label="Reason"
          name="reason"
          id="override-reason"
          required
          placeholder="e.g. body shop quote"
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
        title="Decide"
        submitLabel="Record decision"
        className={BOX}
      >
        <DecisionFields choices={choices} />
        <Field
          label="Charged to the carrier ($, for charge or share)"
          name="amount"
          id="decide-amount"
          inputMode="decimal"
        />
        <Field label="Reason" name="reason" id="decide-reason" required />
        {state === 'open' ? (
          <p className="text-gate-sm text-ink-soft">
            To charge or share, notify the carrier first so they can dispute.
          </p>
        ) : null}
      </ActionForm>,
    );
  }
  if (can.has('close')) {
    forms.push(
      <ActionForm
        key="close"
        action={closeCaseAction}
        hidden={hidden}
        title="Close the case"
        submitLabel="Close case"
        variant="secondary"
        className={BOX}
      >
        <Field label="Note (optional)" name="note" id="close-note" placeholder="e.g. paid, repair done" />
      </ActionForm>,
    );
  }
  return <div className="space-y-3">{forms}</div>;
}
