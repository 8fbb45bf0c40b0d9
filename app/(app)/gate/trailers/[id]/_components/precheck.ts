import { draftToInput, itemChange, needsEvidence, type Draft } from '@/lib/handoffs/draft';
import type { TrailerCondition } from '@/lib/server/handoffs/condition';

/**
 * Client-side check with the shared schema, and the photo-and-note rule, before anything is sent.
 * The schema (and zod with it) is loaded on the first send, not with the form's first page.
 */
export async function precheck(d: Draft, isReefer: boolean, last: TrailerCondition['last']) {
  const { handoffSubmitSchema } = await import('@/lib/validation/handoffs');
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
