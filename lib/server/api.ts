import 'server-only';
import type { z } from 'zod';
import type { Role } from '@/lib/auth/roles';
import { isRefusal, refuse, type FieldErrors, type Refusal, type RefusalCode } from '@/lib/result';
import { describeZodError } from '@/lib/validation/errors';
import { currentUser, type SessionUser } from './auth';
import { appUrl } from './env';
import { knownRefusal } from '@/lib/i18n/refusals';

// The one map from a refusal to an HTTP status. Nothing below lib/server knows about HTTP.
const STATUS: Record<RefusalCode, number> = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  too_large: 413,
  unsupported_type: 415,
  invalid: 422,
  locked: 423,
  too_many: 429,
  unavailable: 503,
};

/** The one shape every route handler answers an expected failure with: `{ code, message, fieldErrors? }`. */
export function refusalResponse(r: Refusal, headers?: HeadersInit): Response {
  // `message` stays English for API clients; `messageKey` (and its values) let a screen say it in the
  // reader's language through the `Refusals` catalogue
  const known = knownRefusal(r.message);
  const body = {
    code: r.code,
    message: r.message,
    ...(known ? { messageKey: known.key, messageValues: known.values } : {}),
    ...(r.fieldErrors ? { fieldErrors: r.fieldErrors } : {}),
    ...(r.detail ?? {}),
  };
  const h = new Headers(headers);
  // a refusal that passes with time says when to try again (RFC 9110 §10.2.3 Retry-After)
  if (r.code === 'unavailable' && !h.has('retry-after')) h.set('retry-after', String(RETRY_AFTER_SECONDS));
  return Response.json(body, { status: STATUS[r.code], headers: h });
}

const RETRY_AFTER_SECONDS = 30;

export function apiError(code: RefusalCode, message: string, fieldErrors?: FieldErrors): Response {
  return refusalResponse(refuse(code, message, fieldErrors));
}

const WRITES = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
const DEFAULT_MAX_BODY = 256 * 1024;

/**
 * A state-changing request must come from our own pages: browsers send Sec-Fetch-Site (or at
 * least Origin) on every cross-site POST, so either one naming another site is refused. Tools
 * that send neither (curl, tests) are not browsers and cannot carry a victim's cookie.
 */
function crossSite(request: Request): Refusal | null {
  const site = request.headers.get('sec-fetch-site');
  if (site && site !== 'same-origin' && site !== 'none') {
    return refuse('forbidden', 'This request came from another site and was refused.');
  }
  const origin = request.headers.get('origin');
  if (origin && origin !== new URL(request.url).origin && origin !== new URL(appUrl()).origin) {
    return refuse('forbidden', 'This request came from another site and was refused.');
  }
  return null;
}

/** A write sends JSON or no body at all: a form or text/plain post is refused even from our own pages. */
function notJson(request: Request): Refusal | null {
  const type = request.headers.get('content-type');
  if (type && !JSON_TYPE.test(type)) return refuse('unsupported_type', 'Send the body as JSON.');
  return null;
}

const JSON_TYPE = /^application\/json\b/i;

async function readBody(request: Request, maxBytes: number): Promise<{ body: unknown } | Refusal> {
  const type = request.headers.get('content-type') ?? '';
  if (!JSON_TYPE.test(type)) return refuse('unsupported_type', 'Send the body as JSON.');
  const declared = Number(request.headers.get('content-length') ?? 0);
  if (declared > maxBytes) return refuse('too_large', 'The request body is too large.');
  const text = await request.text();
  if (Buffer.byteLength(text) > maxBytes) return refuse('too_large', 'The request body is too large.');
  try {
    return { body: JSON.parse(text) as unknown };
  } catch {
    return refuse('bad_request', 'The request body must be JSON.');
  }
}

type Access = readonly Role[] | 'public';
type UserOf<A extends Access> = A extends 'public' ? SessionUser | null : SessionUser;
type Parsed<S> = S extends z.ZodType ? z.output<S> : undefined;

type Spec<A extends Access, B, Q, P> = {
  /** Roles that may call, or 'public' (the user is still read when there is one). */
  access: A;
  body?: B;
  query?: Q;
  params?: P;
  /** Summary when the input does not parse and no issue names the whole input (default: the first issue). */
  invalidMessage?: string;
  maxBodyBytes?: number;
  /** Message of the 404 for params that do not parse (an id that cannot exist). */
  notFound?: string;
};

export type RouteInput<A extends Access, B, Q, P> = {
  request: Request;
  user: UserOf<A>;
  body: Parsed<B>;
  query: Parsed<Q>;
  params: Parsed<P>;
};

/** Query parameters as an object; a key given more than once becomes a list. */
function queryObject(params: URLSearchParams): Record<string, string | string[]> {
  const out: Record<string, string | string[]> = {};
  for (const key of new Set(params.keys())) {
    const all = params.getAll(key);
    out[key] = all.length > 1 ? all : all[0];
  }
  return out;
}

type Ctx = { params: Promise<Record<string, string | string[] | undefined>> };

function parse(schema: z.ZodType | undefined, value: unknown, message?: string) {
  if (!schema) return { ok: true as const, data: undefined };
  const parsed = schema.safeParse(value);
  if (parsed.success) return { ok: true as const, data: parsed.data };
  const first = parsed.error.issues[0]?.message;
  const { message: summary, fieldErrors } = describeZodError(parsed.error, message ?? first);
  return { ok: false as const, refusal: refuse('invalid', summary, fieldErrors) };
}

/**
 * Wraps a route handler: same-site check and JSON for writes, session and role, body, query and
 * params parsed with zod (422 naming the fields), refusals mapped to their status, and unexpected
 * errors logged with context and answered as a JSON 500.
 */
export function route<
  A extends Access,
  B extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  P extends z.ZodType | undefined = undefined,
>(spec: Spec<A, B, Q, P>, handler: (input: RouteInput<A, B, Q, P>) => Promise<Response | Refusal>) {
  return async (request: Request, ctx?: Ctx): Promise<Response> => {
    let user: SessionUser | null = null;
    try {
      if (WRITES.has(request.method)) {
        const refused = crossSite(request) ?? notJson(request);
        if (refused) return refusalResponse(refused);
      }
      user = await currentUser();
      if (spec.access !== 'public') {
        if (!user) return apiError('unauthenticated', 'Sign in first.');
        if (!spec.access.includes(user.role)) return apiError('forbidden', 'Your role may not do this.');
      }
      const rawParams = ctx ? await ctx.params : {};
      const params = parse(spec.params as z.ZodType | undefined, rawParams, spec.invalidMessage);
      if (!params.ok) return refusalResponse(refuse('not_found', spec.notFound ?? 'No such record.'));
      const query = parse(
        spec.query as z.ZodType | undefined,
        queryObject(new URL(request.url).searchParams),
        spec.invalidMessage,
      );
      if (!query.ok) return refusalResponse(query.refusal);
      let rawBody: unknown = undefined;
      if (spec.body) {
        const read = await readBody(request, spec.maxBodyBytes ?? DEFAULT_MAX_BODY);
        if (isRefusal(read)) return refusalResponse(read);
        rawBody = read.body;
      }
      const body = parse(spec.body as z.ZodType | undefined, rawBody, spec.invalidMessage);
      if (!body.ok) return refusalResponse(body.refusal);
      const out = await handler({
        request,
        user: user as UserOf<A>,
        body: body.data as Parsed<B>,
        query: query.data as Parsed<Q>,
        params: params.data as Parsed<P>,
      });
      return isRefusal(out) ? refusalResponse(out) : out;
    } catch (error) {
      const path = new URL(request.url).pathname;
      console.error(`[api] ${request.method} ${path} failed (user ${user?.id ?? 'none'})`, error);
      return Response.json(
        { code: 'internal', message: 'Something went wrong on our side. It has been logged; try again.' },
        { status: 500 },
      );
    }
  };
}
