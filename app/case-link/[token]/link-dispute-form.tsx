import { ActionForm } from '@/app/_components/action-form';
import { Textarea } from '@/app/_components/field';
import { disputeByLinkAction } from '../actions';

export function LinkDisputeForm({ token }: { token: string }) {
  return (
    <ActionForm
      action={disputeByLinkAction}
      hidden={{ token }}
      ariaLabel="Dispute this case"
      submitLabel="Send dispute"
      pendingLabel="Sending…"
      className="rounded-xl bg-paper p-3"
    >
      <Textarea label="Why is this damage not yours?" name="note" rows={4} required minLength={10} />
    </ActionForm>
  );
}
