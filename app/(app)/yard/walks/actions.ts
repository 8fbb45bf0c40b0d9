'use server';

import { revalidatePath } from 'next/cache';
import { redirect } from 'next/navigation';
import { z } from 'zod';
import { resolveWalkOutcome } from '@/db/queries/yard-outcomes';
import { finishWalk } from '@/db/queries/yard-walk-finish';
import { startWalk } from '@/db/queries/yard-walks';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { resolveOutcomeSchema, startWalkSchema } from '@/lib/validation/yard';
import type { ActionState } from '@/lib/yard/result';

const NO_TERMINAL: ActionState = { ok: false, message: 'Your account has no home terminal.' };

export async function startWalkAction(_prev: ActionState, data: FormData): Promise<ActionState> {
  const user = await requireUser(SECTION_ROLES.yard);
  const parsed = startWalkSchema.safeParse({ rowIds: data.getAll('rowIds') });
  if (!parsed.success)
    return {
      ok: false,
      message: parsed.error.issues[0].message,
      fieldErrors: z.flattenError(parsed.error).fieldErrors as Record<string, string[]>,
    };
  if (!user.terminalId) return NO_TERMINAL;
  const walk = await startWalk(user.terminalId, user.id, parsed.data.rowIds);
  if (!walk.ok) return { ok: false, message: walk.message };
  redirect(`/yard/walks/${walk.id}`);
}

export async function finishWalkAction(_prev: ActionState, data: FormData): Promise<ActionState> {
  const user = await requireUser(SECTION_ROLES.yard);
  const id = z.uuid().safeParse(data.get('walkId'));
  if (!id.success) return { ok: false, message: 'No such walk.' };
  if (!user.terminalId) return NO_TERMINAL;
  const done = await finishWalk(id.data, user.terminalId, user.id);
  if (!done.ok) return { ok: false, message: done.message };
  revalidatePath(`/yard/walks/${id.data}`);
  revalidatePath('/yard/tasks');
  return { ok: true, message: 'Walk finished.' };
}

export async function resolveOutcomeAction(_prev: ActionState, data: FormData): Promise<ActionState> {
  const user = await requireUser(SECTION_ROLES.yard);
  const parsed = resolveOutcomeSchema.safeParse(Object.fromEntries(data));
  if (!parsed.success) return { ok: false, message: 'Choose what to do about this outcome.' };
  if (!user.terminalId) return NO_TERMINAL;
  const r = await resolveWalkOutcome({ ...parsed.data, terminalId: user.terminalId, actorId: user.id });
  if (!r.ok) return { ok: false, message: r.message };
  revalidatePath('/yard/walks/[id]', 'page');
  revalidatePath('/yard');
  return { ok: true, message: 'Done.' };
}
