'use server';

import { revalidatePath } from 'next/cache';
import { getTranslations } from 'next-intl/server';
import { SECTION_ROLES } from '@/lib/auth/roles';
import type { Result } from '@/lib/result';
import { formAction } from '@/lib/server/action';
import { addRow, addSpot, renameRow, renameSpot, retireSpot } from '@/lib/server/yard/layout';
import { createRowSchema, createSpotSchema, renameSchema, retireSpotSchema } from '@/lib/validation/yard';

const admin = SECTION_ROLES.admin;

/** The layout changed: the admin page and the yard board show it. */
type Saved = 'rowAdded' | 'renamed' | 'doorAdded' | 'slotAdded' | 'retiredMsg';

async function saved(result: Result<unknown>, key: Saved, values?: Record<string, string>) {
  if (!result.ok) return result;
  revalidatePath('/admin/yard');
  revalidatePath('/yard');
  return { ok: true as const, message: (await getTranslations('Admin'))(`yard.${key}`, values) };
}

export const createRowAction = formAction({ roles: admin, schema: createRowSchema }, async (user, input) =>
  saved(await addRow(user, input), 'rowAdded', { name: input.name }),
);

export const renameRowAction = formAction({ roles: admin, schema: renameSchema }, async (user, input) =>
  saved(await renameRow(user, input), 'renamed'),
);

export const createSpotAction = formAction({ roles: admin, schema: createSpotSchema }, async (user, input) =>
  saved(
    await addSpot(user, { ...input, rowId: input.rowId || undefined }),
    input.kind === 'door' ? 'doorAdded' : 'slotAdded',
    { label: input.label },
  ),
);

export const renameSpotAction = formAction({ roles: admin, schema: renameSchema }, async (user, input) =>
  saved(await renameSpot(user, input), 'renamed'),
);

export const retireSpotAction = formAction({ roles: admin, schema: retireSpotSchema }, async (user, input) =>
  saved(await retireSpot(user, input), 'retiredMsg'),
);
