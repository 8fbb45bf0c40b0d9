import { availableCommands, type CaseState } from '@/lib/desk/case-state';
import {
  closeCaseAction,
  decideCaseAction,
  disputeCaseAction,
  notifyCaseAction,
  overrideEstimateAction,
} from '../../../actions';
import { ActionForm, inputClass } from './action-form';
import { DisputeFields } from './dispute-fields';

type Props = {
  caseId: string;
  trailerId: string;
  itemKey: string;
  state: CaseState;
  role: string;
  carrierEmail: string | null;
  amountDollars: string;
  isDisputeOpen: boolean;
};

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
  const isStaff = role === 'clerk' || role === 'admin';
  const forms: React.ReactNode[] = [];
  if (can.has('dispute') && isDisputeOpen && (role === 'driver' || isStaff)) {
    forms.push(
      <ActionForm
        key="dispute"
        action={disputeCaseAction}
        caseId={caseId}
        title="Dispute this case"
        submit="Send dispute"
        variant="danger"
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
        caseId={caseId}
        title="Notify the carrier"
        submit="Notify carrier"
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
        caseId={caseId}
        title="Change the estimate"
        submit="Save estimate"
        variant="secondary"
      >
        <label className="block text-gate font-bold">
          Amount ($)
          <input
            name="amount"
            inputMode="decimal"
            required
            defaultValue={amountDollars}
            className={inputClass}
          />
        </label>
        <label className="block text-gate font-bold">
          Reason
          <input name="reason" required className={inputClass} placeholder="e.g. body shop quote" />
        </label>
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
        caseId={caseId}
        title="Decide"
        submit="Record decision"
      >
        <fieldset className="grid grid-cols-2 gap-2">
          <legend className="text-gate font-bold">Decision</legend>
          {choices.map((d) => (
            <label
              key={d}
              className="flex min-h-tap items-center gap-2 rounded-lg border-2 border-paper-line px-3 text-gate"
            >
              <input type="radio" name="decision" value={d} required className="h-5 w-5" /> {d}
            </label>
          ))}
        </fieldset>
        <label className="block text-gate font-bold">
          Charged to the carrier ($, for charge or share)
          <input name="amount" inputMode="decimal" className={inputClass} />
        </label>
        <label className="block text-gate font-bold">
          Reason
          <input name="reason" required className={inputClass} />
        </label>
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
        caseId={caseId}
        title="Close the case"
        submit="Close case"
        variant="secondary"
      >
        <label className="block text-gate font-bold">
          Note (optional)
          <input name="note" className={inputClass} placeholder="e.g. paid, repair done" />
        </label>
      </ActionForm>,
    );
  }
  return <div className="space-y-3">{forms}</div>;
}
