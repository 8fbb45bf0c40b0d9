'use server';

import { revalidatePath } from 'next/cache';
import { clearTask } from '@/db/queries/yard-tasks';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { clearTaskSchema } from '@/lib/validation/yard';
import type { ActionState } from '@/lib/yard/result';

export async function clearTaskAction(_prev: ActionState, data: FormData): Promise<ActionState> {
  const user = await requireUser(SECTION_ROLES.yard);
  const parsed = clearTaskSchema.safeParse(Object.fromEntries(data));
  if (!parsed.success) return { ok: false, message: 'No such task.' };
  if (!user.terminalId) return { ok: false, message: 'Your account has no home terminal.' };
  const r = await clearTask(user.terminalId, user.id, parsed.data.id);
  if (!r.ok) return { ok: false, message: r.message };
  revalidatePath('/yard/tasks');
  return { ok: true, message: 'Cleared.' };
}
