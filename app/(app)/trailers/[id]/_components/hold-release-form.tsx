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
  return (
    <ActionForm
      action={releaseHoldAction}
      hidden={{ holdId, trailerId }}
      submitLabel="Record repair and release"
      ariaLabel={`Release hold: ${reason}`}
    >
      <Field
        label="Repaired by"
        name="repairedBy"
        id={`repairedBy-${holdId}`}
        required
        hint="Technician or shop"
      />
      <Field label="What was repaired" name="repairNote" id={`repairNote-${holdId}`} required />
      <Field
        label="When (terminal time)"
        name="repairedAt"
        id={`repairedAt-${holdId}`}
        type="datetime-local"
        required
        defaultValue={nowLocal}
      />
    </ActionForm>
  );
}
