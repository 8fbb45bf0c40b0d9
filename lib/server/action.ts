import 'server-only';
import { getTranslations } from 'next-intl/server';
import type { z } from 'zod';
import type { Role } from '@/lib/auth/roles';
import { localizeRefusal } from '@/lib/i18n/refusals';
import { isRefusal, type ActionState, type FieldErrors, type Refusal } from '@/lib/result';
import { describeZodError } from '@/lib/validation/errors';
import { currentUser, requireUser, type SessionUser } from './auth';

// Never sent back to refill a form.
const SECRET_FIELD = /password|pin|secret|token/i;

function echo(raw: unknown): Record<string, string> {
  if (!raw || typeof raw !== 'object') return {};
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(raw)) {
    if (typeof value === 'string' && !SECRET_FIELD.test(key) && !key.startsWith('$')) out[key] = value;
  }
  return out;
}

/** A refusal's summary and field messages in the reader's language (the services speak English). */
async function localized(formError: string | undefined, fieldErrors: FieldErrors | undefined) {
  const t = await getTranslations('Refusals');
  const say = (m: string) => localizeRefusal(m, (key, values) => t(key, values));
  return {
    formError: formError === undefined ? undefined : say(formError),
    fieldErrors: fieldErrors
      ? Object.fromEntries(Object.entries(fieldErrors).map(([k, list]) => [k, list.map(say)]))
      : undefined,
  };
}

type Access = readonly Role[] | 'public';
type UserOf<A extends Access> = A extends 'public' ? SessionUser | null : SessionUser;

type Spec<S extends z.ZodType, A extends Access> = {
  /** Roles that may call, or 'public' (a signed link, not a session, is the permission). */
  roles: A;
  schema: S;
  /** How to read the form; the default takes each field's last value. */
  read?: (form: FormData) => unknown;
  /** Summary when the input does not parse (default: the first whole-form issue, or a general one). */
  invalidMessage?: string;
};

/** What the work of an action returns: a refusal, or success with an optional message. */
export type ActionOutcome = Refusal | { ok: true; message?: string } | void;

/**
 * The one server-action wrapper: signed-in user with an allowed role (or anyone, when public),
 * the form parsed with the shared schema (field messages and the typed values back on failure),
 * then the work. The work may `redirect()`; a refusal comes back to the form under its fields.
 */
export function formAction<S extends z.ZodType, A extends Access = readonly Role[]>(
  spec: Spec<S, A>,
  work: (user: UserOf<A>, input: z.output<S>) => Promise<ActionOutcome>,
) {
  return async (_prev: ActionState, form: FormData): Promise<ActionState> => {
    const user = (spec.roles === 'public' ? await currentUser() : await requireUser(spec.roles)) as UserOf<A>;
    const raw = spec.read ? spec.read(form) : Object.fromEntries(form);
    const values = echo(Object.fromEntries(form));
    const parsed = spec.schema.safeParse(raw);
    if (!parsed.success) {
      const { message, fieldErrors } = describeZodError(parsed.error, spec.invalidMessage);
      return { ok: false, ...(await localized(message, fieldErrors)), values };
    }
    const outcome = await work(user, parsed.data);
    if (isRefusal(outcome)) {
      return { ok: false, ...(await localized(outcome.message, outcome.fieldErrors)), values };
    }
    return { ok: true, message: outcome?.message };
  };
}
