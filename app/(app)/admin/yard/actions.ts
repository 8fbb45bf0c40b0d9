'use server';

import { revalidatePath } from 'next/cache';
import { SECTION_ROLES } from '@/lib/auth/roles';
import type { Result } from '@/lib/result';
import { formAction } from '@/lib/server/action';
import { addRow, addSpot, renameRow, renameSpot, retireSpot } from '@/lib/server/yard/layout';
import { createRowSchema, createSpotSchema, renameSchema, retireSpotSchema } from '@/lib/validation/yard';

const admin = SECTION_ROLES.admin;

/** The layout changed: the admin page and the yard board show it. */
function saved(result: Result<unknown>, message: string) {
  if (!result.ok) return result;
  revalidatePath('/admin/yard');
  revalidatePath('/yard');
  return { ok: true as const, message };
}

export const createRowAction = formAction({ roles: admin, schema: createRowSchema }, async (user, input) =>
  saved(await addRow(user, input), `Row ${input.name} added.`),
);

export const renameRowAction = formAction({ roles: admin, schema: renameSchema }, async (user, input) =>
  saved(await renameRow(user, input), 'Renamed.'),
);

export const createSpotAction = formAction({ roles: admin, schema: createSpotSchema }, async (user, input) =>
  saved(
    await addSpot(user, { ...input, rowId: input.rowId || undefined }),
    `${input.kind === 'door' ? 'Door' : 'Slot'} ${input.label} added.`,
  ),
);

export const renameSpotAction = formAction({ roles: admin, schema: renameSchema }, async (user, input) =>
  saved(await renameSpot(user, input), 'Renamed.'),
);

export const retireSpotAction = formAction({ roles: admin, schema: retireSpotSchema }, async (user, input) =>
  saved(await retireSpot(user, input), 'Retired.'),
);
