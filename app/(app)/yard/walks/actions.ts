'use server';

import { revalidatePath } from 'next/cache';
import { getTranslations } from 'next-intl/server';
import { redirect } from 'next/navigation';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { formAction } from '@/lib/server/action';
import { finishWalk } from '@/lib/server/yard/finish-walk';
import { resolveOutcome } from '@/lib/server/yard/outcomes';
import { startWalk } from '@/lib/server/yard/walks';
import { finishWalkSchema, resolveOutcomeSchema, startWalkSchema } from '@/lib/validation/yard';

const yard = SECTION_ROLES.yard;

export const startWalkAction = formAction(
  { roles: yard, schema: startWalkSchema, read: (form) => ({ rowIds: form.getAll('rowIds') }) },
  async (user, input) => {
    const walk = await startWalk(user, input);
    if (!walk.ok) return walk;
    redirect(`/yard/walks/${walk.value.id}`);
  },
);

export const finishWalkAction = formAction({ roles: yard, schema: finishWalkSchema }, async (user, input) => {
  const finished = await finishWalk(user, input);
  if (!finished.ok) return finished;
  revalidatePath(`/yard/walks/${input.walkId}`);
  revalidatePath('/yard/tasks');
  return { ok: true, message: (await getTranslations('Walk'))('finishedMsg') };
});

export const resolveOutcomeAction = formAction(
  { roles: yard, schema: resolveOutcomeSchema },
  async (user, input) => {
    const resolved = await resolveOutcome(user, input);
    if (!resolved.ok) return resolved;
    revalidatePath('/yard/walks/[id]', 'page');
    revalidatePath('/yard');
    return { ok: true, message: (await getTranslations('Walk'))('doneMsg') };
  },
);
