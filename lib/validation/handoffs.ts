import { z } from 'zod';
import { CONDITIONS } from '@/lib/engine/conditions';
import { noteText, plainText } from './text';

// One schema for the gate form (client-side feedback), POST /api/handoffs and the seed.
// The server stays the authority: item keys are checked against the trailer's checklist, and
// the photo-and-note rule for new or worse damage is enforced after the engine's comparison.

import { HANDOFF_LIMITS, TREAD_LIMITS } from '@/lib/handoffs/limits';

export { HANDOFF_LIMITS, TREAD_LIMITS };
const L = HANDOFF_LIMITS;

export const CONDITION_VALUES = CONDITIONS;
export const conditionSchema = z.enum(CONDITION_VALUES, { error: 'Choose a condition.' });

const optionalNote = (max: number, what: string) =>
  noteText(max, `${what} is at most ${max} characters.`)
    .transform((s) => (s === '' ? null : s))
    .nullable()
    .optional();

/** What was seen of one checklist item; fields not asked by the item's kind are dropped by the server. */
export const itemObservationSchema = z.object({
  condition: conditionSchema,
  treadThirtySeconds: z
    .number({ error: 'Tread is a whole number of 32nds of an inch.' })
    .int({ error: 'Tread is a whole number of 32nds of an inch.' })
    .min(L.tread.min, { error: 'Tread cannot be below 0/32 in.' })
    .max(L.tread.max, { error: 'Tread above 32/32 in is not a trailer tire.' })
    .optional(),
  isHoldingAir: z.boolean().optional(),
  isEngaged: z.boolean().optional(),
  isMounted: z.boolean().optional(),
  isLocking: z.boolean().optional(),
  isInsulationShowing: z.boolean().optional(),
  isLeaking: z.boolean().optional(),
  cleanliness: z.enum(['clean', 'sweep', 'washout']).optional(),
  note: optionalNote(L.itemNote, 'A note'),
  photoIds: z
    .array(z.uuid({ error: 'A photo reference is not valid.' }))
    .max(6, { error: 'At most 6 photos per item.' })
    .optional(),
});
export type ItemObservationInput = z.infer<typeof itemObservationSchema>;

export const itemKeySchema = z
  .string()
  .regex(/^[a-z0-9_]+(\.[a-z0-9_]+){1,3}$/, { error: 'Unknown checklist item.' });

export const reeferReadingsSchema = z.object({
  isUnitOn: z.boolean().nullable(),
  setpointF: z
    .number({ error: 'Setpoint is a number in °F.' })
    .min(L.setpointF.min, { error: `Setpoint is ${L.setpointF.min} °F or above.` })
    .max(L.setpointF.max, { error: `Setpoint is ${L.setpointF.max} °F or below.` })
    .nullable(),
  returnAirF: z
    .number({ error: 'Return air is a number in °F.' })
    .min(L.returnAirF.min, { error: `Return air is ${L.returnAirF.min} °F or above.` })
    .max(L.returnAirF.max, { error: `Return air is ${L.returnAirF.max} °F or below.` })
    .nullable(),
  engineHours: z
    .number({ error: 'Engine hours is a number.' })
    .min(L.engineHours.min, { error: 'Engine hours cannot be negative.' })
    .max(L.engineHours.max, {
      error: `Engine hours are at most ${L.engineHours.max.toLocaleString('en-US')}.`,
    })
    .nullable(),
  preTripResult: z.enum(['pass', 'fail', 'not_run'], { error: 'Choose the last pre-trip result.' }),
  preTripAt: z.iso.datetime({ offset: true, error: 'Give the time of the last pre-trip.' }).nullable(),
});

export const handoffSubmitSchema = z
  .object({
    idempotencyKey: z
      .string()
      .regex(/^[A-Za-z0-9_-]{16,80}$/, { error: 'The draft key is not valid; start a new draft.' }),
    trailerId: z.uuid({ error: 'Unknown trailer.' }),
    kind: z.enum(['drop', 'hook'], { error: 'Choose drop or hook.' }),
    carrierId: z.uuid({ error: 'Choose the carrier.' }),
    driverName: plainText(L.driverName, `The name is at most ${L.driverName} characters.`).min(2, {
      error: "Enter the driver's name.",
    }),
    tractorNumber: z
      .string()
      .trim()
      .toUpperCase()
      .regex(new RegExp(`^[A-Z0-9-]{1,${L.tractorNumber}}$`), {
        error: `Enter the tractor number: up to ${L.tractorNumber} letters, digits or dashes.`,
      }),
    isLoaded: z.boolean({ error: 'Say whether the trailer is loaded or empty.' }),
    sealNumber: z
      .string()
      .trim()
      .toUpperCase()
      .regex(new RegExp(`^[A-Z0-9-]{0,${L.sealNumber}}$`), {
        error: `A seal number is up to ${L.sealNumber} letters, digits and dashes.`,
      })
      .transform((s) => (s === '' ? null : s))
      .nullable()
      .optional(),
    fuelEighths: z
      .number()
      .int({ error: 'Fuel is read in eighths, 0 to 8.' })
      .min(0, { error: 'Fuel is read in eighths, 0 to 8.' })
      .max(8, { error: 'Fuel is read in eighths, 0 to 8.' })
      .nullable(),
    reefer: reeferReadingsSchema.nullable(),
    items: z
      .record(itemKeySchema, itemObservationSchema)
      .refine((r) => Object.keys(r).length <= 120, { error: 'Too many items.' }),
    spotId: z.uuid({ error: 'Choose a slot.' }).nullable().optional(),
    /** Asked at a hook of a "no perishable loads" trailer. */
    isLoadPerishable: z.boolean({ error: 'Say whether the load is perishable.' }).nullable().optional(),
    note: optionalNote(L.note, 'The note'),
    correctsHandoffId: z.uuid({ error: 'Name the handoff this corrects by its id.' }).nullable().optional(),
    /** Why the record is corrected: required of a clerk, optional for the driver who recorded it. */
    correctionReason: plainText(300, 'The reason is at most 300 characters.')
      .transform((s) => (s === '' ? null : s))
      .nullable()
      .optional(),
  })
  .superRefine((v, ctx) => {
    if (v.correctionReason && !v.correctsHandoffId) {
      ctx.addIssue({
        code: 'custom',
        path: ['correctionReason'],
        message: 'A reason goes with a correction only.',
      });
    }
    if (v.reefer && v.reefer.preTripResult !== 'not_run' && !v.reefer.preTripAt) {
      ctx.addIssue({
        code: 'custom',
        path: ['reefer', 'preTripAt'],
        message: 'Give the time of the last pre-trip.',
      });
    }
  });
export type HandoffSubmitInput = z.infer<typeof handoffSubmitSchema>;

/** Verification codes: 8 Crockford base32 characters, shown as XXXX-XXXX. */
export const verificationCodeSchema = z
  .string()
  .trim()
  .toUpperCase()
  .transform((s) => s.replace(/[\s-]/g, '').replace(/O/g, '0').replace(/[IL]/g, '1'))
  .pipe(
    z.string().regex(/^[0-9A-HJKMNP-TV-Z]{8}$/, {
      error: 'A verification code is 8 letters and digits, like 7KQ2-M9XD.',
    }),
  );

export const uploadRequestSchema = z.object({
  /** The phone's own id for the photo (a photo taken without signal is referenced before it is sent). */
  photoId: z.uuid({ error: 'Not a valid photo id.' }).optional(),
  trailerId: z.uuid({ error: 'Unknown trailer.' }),
  itemKey: itemKeySchema,
  contentType: z.string().trim().toLowerCase().max(100),
  byteSize: z
    .number()
    .int({ error: 'The size is a whole number of bytes.' })
    .min(1, { error: 'The photo is empty.' }),
  sha256: z
    .string()
    .trim()
    .toLowerCase()
    .regex(/^[0-9a-f]{64}$/, { error: 'The checksum must be 64 hex digits (SHA-256).' }),
});
export type UploadRequestInput = z.infer<typeof uploadRequestSchema>;

export const idParamSchema = z.uuid({ error: 'Not found.' });

/** `POST /api/uploads/[id]/complete`: the capture time the phone read from the photo, if any. */
export const uploadCompleteSchema = z.object({
  capturedAt: z.iso
    .datetime({ offset: true, error: 'The capture time must be a date and time with its zone.' })
    .nullish(),
});
export type UploadCompleteInput = z.infer<typeof uploadCompleteSchema>;
