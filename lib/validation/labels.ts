import { z } from 'zod';
import { validateVin, type VinError } from '@/lib/engine/identity';
import { LABEL_TOKEN_PATTERN, normalizeScannedVin } from '@/lib/labels/scan-text';

const VIN_MESSAGES: Record<VinError, string> = {
  length: 'A VIN has 17 characters.',
  characters: 'A VIN has only digits and capital letters, never I, O or Q.',
  check_digit:
    'This VIN does not add up: its check digit (9th character) is wrong. Check it, or type the unit number.',
};

export const unitNumberSchema = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9-]{2,20}$/, { error: 'A unit number is 2 to 20 letters, digits or dashes.' });

/** A VIN as typed or scanned: normalised (leading `I` marker dropped), then checked per 49 CFR 565.15. */
export const scannedVinSchema = z
  .string()
  .max(40, { error: VIN_MESSAGES.length })
  .transform((raw, ctx) => {
    const result = validateVin(normalizeScannedVin(raw));
    if (result.ok) return result.vin;
    ctx.addIssue({ code: 'custom', message: VIN_MESSAGES[result.error] });
    return z.NEVER;
  });

export const labelTokenSchema = z
  .string()
  .trim()
  .regex(LABEL_TOKEN_PATTERN, { error: 'This label is not a Hitchmark label or it is damaged.' });

/** GET /api/trailers/lookup: exactly one of token, unit or vin. */
export const trailerLookupSchema = z
  .object({
    token: labelTokenSchema.optional(),
    unit: unitNumberSchema.optional(),
    vin: scannedVinSchema.optional(),
  })
  .refine((q) => [q.token, q.unit, q.vin].filter((v) => v !== undefined).length === 1, {
    error: 'Look up by exactly one of: token, unit or vin.',
  });
export type TrailerLookupInput = z.infer<typeof trailerLookupSchema>;

const uuid = z.uuid({ error: 'That is not a trailer or row id.' });
const idList = z
  .union([z.string(), z.array(z.string())])
  .transform((v) =>
    (Array.isArray(v) ? v : [v])
      .flatMap((s) => s.split(','))
      .map((s) => s.trim())
      .filter(Boolean),
  )
  .pipe(
    z
      .array(uuid)
      .min(1, { error: 'Choose at least one trailer.' })
      .max(200, { error: 'Print at most 200 labels at a time.' }),
  );

/** Which labels a sheet or PDF prints: a selection of trailers (`ids`, repeated or comma-separated) or a yard row. */
export const labelSheetQuerySchema = z
  .object({ ids: idList.optional(), row: uuid.optional() })
  .refine((q) => (q.ids === undefined) !== (q.row === undefined), {
    error: 'Choose trailers or one row, not both.',
  });
export type LabelSheetQuery = z.infer<typeof labelSheetQuerySchema>;

export const reissueLabelSchema = z.object({ trailerId: uuid });
