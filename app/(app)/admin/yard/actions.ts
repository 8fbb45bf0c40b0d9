'use server';

import { revalidatePath } from 'next/cache';
import { z } from 'zod';
import { createRow, createSpot, renameRow, renameSpot, retireSpot } from '@/db/queries/yard-layout';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { createRowSchema, createSpotSchema, renameSchema, retireSpotSchema } from '@/lib/validation/yard';
import type { ActionState } from '@/lib/yard/result';
import type { Refusal } from '@/lib/yard/result';

async function admin() {
  const user = await requireUser(SECTION_ROLES.admin);
  return user.terminalId ? { id: user.id, terminalId: user.terminalId } : null;
}

function invalidState(error: z.ZodError): ActionState {
  const fieldErrors = z.flattenError(error).fieldErrors as Record<string, string[]>;
  return { ok: false, message: error.issues[0]?.message ?? 'Check the fields.', fieldErrors };
}

function done(r: { ok: true } | Refusal, message: string): ActionState {
  if (!r.ok) return { ok: false, message: r.message };
  revalidatePath('/admin/yard');
  revalidatePath('/yard');
  return { ok: true, message };
}

const NO_TERMINAL: ActionState = { ok: false, message: 'Your account has no home terminal.' };

export async function createRowAction(_p: ActionState, data: FormData): Promise<ActionState> {
  const user = await admin();
  const parsed = createRowSchema.safeParse(Object.fromEntries(data));
  if (!parsed.success) return invalidState(parsed.error);
  if (!user) return NO_TERMINAL;
  return done(await createRow(user.terminalId, user.id, parsed.data.name), `Row ${parsed.data.name} added.`);
}

export async function renameRowAction(_p: ActionState, data: FormData): Promise<ActionState> {
  const user = await admin();
  const parsed = renameSchema.safeParse(Object.fromEntries(data));
  if (!parsed.success) return invalidState(parsed.error);
  if (!user) return NO_TERMINAL;
  return done(await renameRow(user.terminalId, user.id, parsed.data.id, parsed.data.name), 'Renamed.');
}

export async function createSpotAction(_p: ActionState, data: FormData): Promise<ActionState> {
  const user = await admin();
  const parsed = createSpotSchema.safeParse(Object.fromEntries(data));
  if (!parsed.success) return invalidState(parsed.error);
  if (!user) return NO_TERMINAL;
  const { kind, label, rowId } = parsed.data;
  return done(
    await createSpot(user.terminalId, user.id, { kind, label, rowId: rowId || undefined }),
    `${kind === 'door' ? 'Door' : 'Slot'} ${label} added.`,
  );
}

export async function renameSpotAction(_p: ActionState, data: FormData): Promise<ActionState> {
  const user = await admin();
  const parsed = renameSchema.safeParse(Object.fromEntries(data));
  if (!parsed.success) return invalidState(parsed.error);
  if (!user) return NO_TERMINAL;
  return done(await renameSpot(user.terminalId, user.id, parsed.data.id, parsed.data.name), 'Renamed.');
}

export async function retireSpotAction(_p: ActionState, data: FormData): Promise<ActionState> {
  const user = await admin();
  const parsed = retireSpotSchema.safeParse(Object.fromEntries(data));
  if (!parsed.success) return invalidState(parsed.error);
  if (!user) return NO_TERMINAL;
  return done(await retireSpot(user.terminalId, user.id, parsed.data.id), 'Retired.');
}
