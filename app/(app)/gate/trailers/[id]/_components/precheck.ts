import { draftToInput, itemChange, needsEvidence, type Draft } from '@/lib/handoffs/draft';
import type { TrailerCondition } from '@/lib/server/handoffs/condition';
import { handoffSubmitSchema } from '@/lib/validation/handoffs';

/** Client-side check with the shared schema, and the photo-and-note rule, before anything is sent. */
export function precheck(d: Draft, isReefer: boolean, last: TrailerCondition['last']) {
  const body = draftToInput(d, isReefer);
  const errors: Record<string, string[]> = {};
  const parsed = handoffSubmitSchema.safeParse(body);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key =
        issue.path[0] === 'items' ? `items.${String(issue.path[1])}` : issue.path.map(String).join('.');
      (errors[key] ??= []).push(issue.message);
    }
  }
  for (const [key, it] of Object.entries(d.items)) {
    if (needsEvidence(itemChange(it, last[key]), it) && (!it.photos?.length || !it.note?.trim())) {
      (errors[`items.${key}`] ??= []).push('New or worse damage needs a photo and a note.');
    }
  }
  return { body: parsed.success ? parsed.data : body, errors };
}
