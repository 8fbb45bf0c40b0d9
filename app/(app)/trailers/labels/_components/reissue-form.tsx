import { ActionForm } from '@/app/_components/action-form';
import { reissueLabelAction } from '../actions';

/** Re-issue asks once more in words: the label on the trailer stops working at once. */
export function ReissueForm({ trailerId, unitNumber }: { trailerId: string; unitNumber: string }) {
  return (
    <section aria-labelledby="reissue-title" className="space-y-2 rounded-xl bg-paper p-4">
      <h2 id="reissue-title" className="text-gate-lg font-bold">
        Re-issue this label
      </h2>
      <p className="text-gate">
        Use this when the label on {unitNumber} is torn, faded or lost. The old label stops working at once; a
        driver who scans it is told to use the new one.
      </p>
      <ActionForm
        action={reissueLabelAction}
        hidden={{ trailerId }}
        submitLabel="Re-issue label"
        pendingLabel="Re-issuing…"
        variant="danger"
      />
    </section>
  );
}
