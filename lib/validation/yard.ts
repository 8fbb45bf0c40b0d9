import { z } from 'zod';
import { BOARD_FILTERS } from '@/lib/yard/board';
import { madeAtProblem } from '@/lib/yard/move-time';
import { SORT_DIRS, SORT_KEYS } from '@/lib/yard/table';
import { WALK_RESOLUTIONS } from '@/lib/yard/walk';
import { plainText } from './text';

const uuid = z.uuid('Not a valid id.');
const label = plainText(40).min(1, 'Enter a name.');

export const boardQuerySchema = z.object({
  filter: z
    .preprocess((v) => (typeof v === 'string' && v ? v.split(',') : []), z.array(z.enum(BOARD_FILTERS)))
    .default([]),
  sort: z.enum(SORT_KEYS).default('slot'),
  dir: z.enum(SORT_DIRS).default('asc'),
});

export const moveSchema = z.object({
  unit: plainText(200).min(1, 'Scan or type the unit number.'),
  target: plainText(40).min(1, 'Scan or type the target slot or door.'),
  /** The phone's idempotency key: a move queued without signal is recorded once. */
  clientKey: plainText(80).min(8, 'Not a valid move key.').optional(),
  /**
   * When the jockey made the move, by the phone's clock (a queued move arrives later). Checked
   * against the clock at parse time; the service checks it again against its own `now`.
   */
  madeAt: z.iso
    .datetime({ offset: true, error: 'Not a valid time for the move.' })
    .superRefine((value, ctx) => {
      const problem = madeAtProblem(new Date(value), new Date());
      if (problem) ctx.addIssue({ code: 'custom', message: problem });
    })
    .optional(),
});
export type MoveInput = z.infer<typeof moveSchema>;

export const createRowSchema = z.object({ name: label });
export const renameSchema = z.object({ id: uuid, name: label });
export const createSpotSchema = z
  .object({
    kind: z.enum(['slot', 'door']),
    rowId: z.union([uuid, z.literal('')]).optional(),
    label: label,
  })
  .refine((v) => v.kind === 'door' || !!v.rowId, {
    message: 'A slot belongs to a row: choose one.',
    path: ['rowId'],
  });
export const retireSpotSchema = z.object({ id: uuid });

export const startWalkSchema = z.object({ rowIds: z.array(uuid).min(1, 'Choose at least one row.').max(50) });

const optionalBool = z.boolean().nullable().default(null);
export const walkScanSchema = z.object({
  clientKey: plainText(80).min(8),
  scannedText: plainText(400).min(1, 'Scan or type the unit.'),
  spotId: uuid,
  scannedAt: z.iso.datetime({ offset: true }),
  isUnitRunning: optionalBool,
  setpointTenthsF: z.number().int().min(-400).max(900).nullable().default(null),
  fuelEighths: z
    .number()
    .int()
    .min(0, 'Fuel is 0–8 eighths.')
    .max(8, 'Fuel is 0–8 eighths.')
    .nullable()
    .default(null),
  areDoorsClosed: optionalBool,
  isSealPresent: optionalBool,
});
export type WalkScanInput = z.infer<typeof walkScanSchema>;

export const resolveOutcomeSchema = z.object({
  outcomeId: uuid,
  resolution: z.enum(WALK_RESOLUTIONS),
});

export const clearTaskSchema = z.object({ id: uuid });
export const finishWalkSchema = z.object({ walkId: uuid });
