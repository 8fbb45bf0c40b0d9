import { z } from 'zod';
import { CASE_STATES, DECISIONS } from '@/lib/desk/case-state';
import { parseDollarsToCents } from '@/lib/desk/estimate';
import { noteText, plainText } from './text';

/** The largest amount a person may type: $1,000,000.00. */
const MAX_CENTS = 100_000_000;

/** What is actually wrong with a typed amount, in words a clerk can read out. */
export function dollarsProblem(text: string, cents: number | null): string {
  const t = text.trim();
  if (t === '') return 'Enter an amount in dollars, like 425.00.';
  if (/^-/.test(t)) return 'An amount cannot be negative.';
  const rough = Number(t.replace(/[$,\s]/g, ''));
  if ((cents !== null && cents > MAX_CENTS) || (Number.isFinite(rough) && rough * 100 > MAX_CENTS))
    return 'An amount is at most $1,000,000.00.';
  if (/^\$?\s*[\d,]+\.\d{3,}$/.test(t)) return 'Use at most two decimals (cents), like 425.50.';
  if (/^\$?\s*[\d,]*\.?\d*$/.test(t) && /\d/.test(t))
    return 'Put commas only between groups of three digits, like 1,250.00.';
  return 'Enter an amount in dollars using digits only, like 425.00.';
}

/** A dollar amount typed by a person ("1,234.56"), read as whole cents without floating point. */
export const dollarsSchema = z
  .string({ error: 'Enter an amount in dollars, like 425.00.' })
  .trim()
  .transform((text, ctx) => {
    const cents = parseDollarsToCents(text);
    if (cents === null || cents > MAX_CENTS) {
      ctx.addIssue({ code: 'custom', message: dollarsProblem(text, cents) });
      return z.NEVER;
    }
    return cents;
  });

const optionalDollars = z
  .string()
  .trim()
  .optional()
  .transform((text, ctx) => {
    if (!text) return undefined;
    const cents = parseDollarsToCents(text);
    if (cents === null) {
      ctx.addIssue({ code: 'custom', message: 'Enter an amount in dollars, like 500.' });
      return z.NEVER;
    }
    return cents;
  });

const blankToUndefined = (v: unknown) => (v === '' || v === null ? undefined : v);

export const CASE_SORTS = ['oldest', 'newest', 'amount_high', 'amount_low'] as const;
export const CASE_AGES = ['7', '30', '90'] as const;

/** The desk queue's query string: every filter optional; a bad value is a field error, not a crash. */
export const caseQueueQuerySchema = z.object({
  state: z.preprocess(
    blankToUndefined,
    z.enum(CASE_STATES, { error: 'Choose a state from the list.' }).optional(),
  ),
  carrier: z.preprocess(blankToUndefined, z.uuid({ error: 'Choose a carrier from the list.' }).optional()),
  olderThanDays: z.preprocess(
    blankToUndefined,
    z.enum(CASE_AGES, { error: 'Choose an age from the list.' }).optional(),
  ),
  minAmount: z.preprocess(blankToUndefined, optionalDollars),
  maxAmount: z.preprocess(blankToUndefined, optionalDollars),
  sort: z.preprocess(
    blankToUndefined,
    z.enum(CASE_SORTS, { error: 'Choose a sort order from the list.' }).default('oldest'),
  ),
  /** Keyset cursor of the oldest/newest sorts: the last row shown, as `<opened-at ISO>_<case id>`. */
  after: z.preprocess(
    blankToUndefined,
    z
      .string()
      .regex(/^\d{4}-\d{2}-\d{2}T[\d:.]+Z_[0-9a-f-]{36}$/, { error: 'This page link is not valid.' })
      .transform((v) => ({ openedAt: new Date(v.slice(0, v.indexOf('_'))), id: v.slice(v.indexOf('_') + 1) }))
      .refine((v) => !Number.isNaN(v.openedAt.getTime()), { error: 'This page link is not valid.' })
      .optional(),
  ),
});
/** Cases per page of the desk queue. */
export const CASE_PAGE_SIZE = 50;
/** The cursor that continues the queue after this row. */
export const caseCursor = (row: { openedAt: Date; id: string }) => `${row.openedAt.toISOString()}_${row.id}`;
export type CaseQueueQuery = z.infer<typeof caseQueueQuerySchema>;

export const REASON_MAX = 2000;
const reasonSchema = plainText(REASON_MAX, `A reason is at most ${REASON_MAX} characters; shorten it.`).min(
  3,
  {
    error: 'Give a reason (a few words at least).',
  },
);
const caseIdSchema = z.uuid({ error: 'This case does not exist.' });

export const notifyCaseSchema = z.object({ caseId: caseIdSchema });
export const closeCaseSchema = z.object({
  caseId: caseIdSchema,
  note: noteText(2000).optional(),
});
/** Photo ids from the form, comma separated (uploaded first through /api/uploads). */
const photoIdsSchema = z
  .string()
  .optional()
  .transform((v) =>
    v
      ? v
          .split(',')
          .map((x) => x.trim())
          .filter(Boolean)
      : [],
  )
  .pipe(
    z
      .array(z.uuid({ error: 'A photo reference is not valid; take the photo again.' }))
      .max(6, { error: 'At most 6 photos.' }),
  );

export const disputeCaseSchema = z.object({
  caseId: caseIdSchema,
  photoIds: photoIdsSchema,
  note: noteText(4000).min(10, { error: 'Say why you dispute the case (10 characters at least).' }),
});
export const linkDisputeSchema = disputeCaseSchema
  .omit({ caseId: true, photoIds: true })
  .extend({ token: plainText(300).min(10) });
export const overrideEstimateSchema = z.object({
  caseId: caseIdSchema,
  amount: dollarsSchema,
  reason: reasonSchema,
});
export const decideCaseSchema = z
  .object({
    caseId: caseIdSchema,
    decision: z.enum(DECISIONS, { error: 'Choose charge, share, absorb or waive.' }),
    amount: z.preprocess(blankToUndefined, optionalDollars),
    reason: reasonSchema,
  })
  .transform((v) => ({
    ...v,
    chargedCents: v.decision === 'absorb' || v.decision === 'waive' ? 0 : (v.amount ?? 0),
  }));

export const RATE_CONDITIONS = ['minor', 'damaged', 'unsafe', 'missing'] as const;
export type RateCondition = (typeof RATE_CONDITIONS)[number];
export const itemPatternSchema = z
  .string({ error: 'Enter an item key or prefix.' })
  .trim()
  .toLowerCase()
  .regex(/^[a-z0-9_]+(\.[a-z0-9_]+)*$/, {
    error: 'Use a checklist key or prefix, like rear.door_left or tires.',
  })
  .max(120);
export const addRateSchema = z.object({
  itemPattern: itemPatternSchema,
  condition: z.enum(RATE_CONDITIONS, { error: 'Choose a condition.' }),
  amount: dollarsSchema,
});
export const changeRateSchema = z.object({
  id: z.uuid({ error: 'This rate does not exist.' }),
  amount: dollarsSchema,
});

export const releaseHoldSchema = z.object({
  holdId: z.uuid({ error: 'This hold does not exist.' }),
  trailerId: z.uuid(),
  repairedBy: plainText(200).min(2, { error: 'Who repaired it? (name or shop)' }),
  repairNote: plainText(2000).min(5, { error: 'Say what was repaired.' }),
  repairedAt: z
    .string({ error: 'When was it repaired?' })
    .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/, { error: 'Enter the date and time of the repair.' }),
});

export const TRAILER_FILE_KINDS = ['handoff', 'move', 'walk', 'finding', 'hold', 'case', 'photo'] as const;
export const trailerFileQuerySchema = z.object({
  kind: z.preprocess(
    blankToUndefined,
    z.enum(TRAILER_FILE_KINDS, { error: 'Choose a kind from the list.' }).optional(),
  ),
  /** `check`: re-hash the trailer's recorded photos against the record. */
  photos: z.preprocess(blankToUndefined, z.enum(['check']).optional()),
  /** `check`: re-hash the trailer's whole handoff chain (on demand: it reads every record). */
  chain: z.preprocess(blankToUndefined, z.enum(['check']).optional()),
  /** A page's start, `<ISO time>_<handoff id>` of the last handoff on the page before. */
  before: z.preprocess(
    blankToUndefined,
    z
      .string()
      .regex(/^\d{4}-\d{2}-\d{2}T[\d:.]+Z_[0-9a-f-]{36}$/i, { error: 'Not a page of this file.' })
      .transform((v) => ({ at: new Date(v.slice(0, v.indexOf('_'))), id: v.slice(v.indexOf('_') + 1) }))
      .refine((c) => !Number.isNaN(c.at.getTime()) && z.uuid().safeParse(c.id).success, {
        error: 'Not a page of this file.',
      })
      .optional(),
  ),
});

/** The `before` value that opens the page after one ending at `c`. */
export const fileCursorParam = (c: { at: Date; id: string }) => `${c.at.toISOString()}_${c.id}`;

export const reportQuerySchema = z.object({
  months: z.preprocess(
    blankToUndefined,
    z.coerce.number({ error: 'months must be a number' }).int().min(1).max(36).default(12),
  ),
});

/** Resend of a failed e-mail from the desk. */
export const resendEmailSchema = z.object({ emailId: z.uuid({ error: 'Unknown e-mail.' }) });
