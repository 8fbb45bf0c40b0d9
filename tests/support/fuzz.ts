// Fuzzing every API route over HTTP with fast-check: malformed JSON, wrong types, control
// characters, huge and negative numbers, oversized bodies, wrong methods and content types.
// Used by tests/e2e/fuzz.spec.ts (1,000 requests, in the test command) and scripts/fuzz.ts
// (`npm run fuzz -- --runs 10000`, by hand, against a running app).
import fc from 'fast-check';
import { ROUTES } from './access-matrix';

export type FuzzRequest = {
  method: string;
  path: string;
  headers: Record<string, string>;
  body?: string;
};

/** The API's URL templates, from the access matrix's route rows: `app/api/x/[id]/y/route.ts` → `/api/x/:id/y`. */
export const TEMPLATES = [...new Set(ROUTES.map((r) => r.file))].map((file) => ({
  methods: ROUTES.filter((r) => r.file === file).map((r) => r.method),
  path: file
    .replace(/^app/, '')
    .replace(/\/route\.ts$/, '')
    .replace(/\/\([^)]+\)/g, '')
    .replace(/\[(\w+)\]/g, ':$1'),
}));

// field names the API's schemas use, so generated objects reach the field checks and not only the shape check
const FIELDS = [
  'trailerId',
  'kind',
  'driverName',
  'note',
  'items',
  'fuelEighths',
  'idempotencyKey',
  'carrierId',
  'reefer',
  'occurredAt',
  'tractorNumber',
  'spotId',
  'correctsHandoffId',
  'unit',
  'target',
  'scannedText',
  'clientKey',
  'scannedAt',
  'contentType',
  'byteSize',
  'sha256',
  'photoIds',
  'q',
  'limit',
  'offset',
  'token',
  'vin',
  'ids',
  'row',
  'filter',
  'sort',
  'dir',
  'from',
  'to',
  'format',
  'id',
];

const control = fc.constantFrom('\u0000', '\u0007', '\u001b', '\u007f', '\r\n', '\t', '\u202e', '\ud800');
const nastyString = fc.oneof(
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.tuple(fc.string({ maxLength: 10 }), control, fc.string({ maxLength: 10 })).map(([a, c, b]) => a + c + b),
  fc.constantFrom(
    '',
    ' ',
    "'; DROP TABLE handoffs; --",
    '<script>alert(1)</script>',
    '../../etc/passwd',
    '%00',
    '😀',
  ),
  fc.uuid().map(String),
  fc.integer({ min: 1, max: 20 }).map((n) => 'x'.repeat(n * 1000)),
);
const nastyNumber = fc.oneof(
  fc.integer(),
  fc.double(),
  fc.constantFrom(-1, 0, -0, 2 ** 53, -(2 ** 53), 1e308, -1e308, 2 ** 31, 0.5),
);
const anyValue: fc.Arbitrary<unknown> = fc.letrec((tie) => ({
  value: fc.oneof(
    { depthSize: 'small' },
    nastyString,
    nastyNumber,
    fc.boolean(),
    fc.constant(null),
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(fc.oneof(fc.constantFrom(...FIELDS), fc.string({ maxLength: 8 })), tie('value'), {
      maxKeys: 5,
    }),
  ),
})).value;
const fieldObject = fc.dictionary(fc.constantFrom(...FIELDS), anyValue, { maxKeys: 8 });

const body = fc.oneof(
  fieldObject.map((o) => JSON.stringify(o)),
  anyValue.map((v) => JSON.stringify(v) ?? 'null'),
  fc.constantFrom(
    '{',
    '{"kind": "drop",',
    '[1,2',
    'null',
    '"',
    '{"a":1}}',
    '\u0000',
    'NaN',
    '{"__proto__": {"x": 1}}',
  ),
  fc.string({ maxLength: 200 }),
  // oversized: past the 256 KB body limit
  fc.integer({ min: 257, max: 400 }).map((kb) => JSON.stringify({ note: 'n'.repeat(kb * 1024) })),
);

/** encodeURIComponent, with lone surrogates (which it refuses) replaced first. */
const enc = (s: string) =>
  encodeURIComponent(
    s.replace(/[\ud800-\udfff]/g, (c, i, all) =>
      /[\ud800-\udbff][\udc00-\udfff]/.test(all.slice(i, i + 2)) ||
      /[\ud800-\udbff][\udc00-\udfff]/.test(all.slice(i - 1, i + 1))
        ? c
        : '\ufffd',
    ),
  );

const pathSegment = fc.oneof(
  fc.uuid().map(String),
  nastyString.map((s) => enc(s.slice(0, 200))),
  nastyNumber.map(String),
  fc.constantFrom('..', '%2e%2e', 'null', 'undefined', '0'),
);

const query = fc
  .dictionary(
    fc.oneof(fc.constantFrom(...FIELDS), fc.string({ maxLength: 6 })),
    fc.oneof(nastyString, nastyNumber.map(String)),
    {
      maxKeys: 4,
    },
  )
  .map((q) => {
    const s = Object.entries(q)
      .map(([k, v]) => `${enc(k)}=${enc(String(v).slice(0, 2000))}`)
      .join('&');
    return s ? `?${s}` : '';
  });

export function requests(origin: string): fc.Arbitrary<FuzzRequest> {
  return fc
    .record({
      template: fc.constantFrom(...TEMPLATES),
      segments: fc.array(pathSegment, { minLength: 3, maxLength: 3 }),
      query,
      // mostly a method the route has, so input reaches its parsers; sometimes any other
      wrongMethod: fc.oneof(
        { weight: 4, arbitrary: fc.constant(null) },
        { weight: 1, arbitrary: fc.constantFrom('GET', 'POST', 'PUT', 'PATCH', 'DELETE', 'OPTIONS', 'HEAD') },
      ),
      contentType: fc.oneof(
        { weight: 4, arbitrary: fc.constant('application/json') },
        {
          weight: 1,
          arbitrary: fc.constantFrom(
            '',
            'text/plain',
            'application/x-www-form-urlencoded',
            'multipart/form-data; boundary=x',
            'application/json; charset=utf-16',
            'application/xml',
            '\u0000',
          ),
        },
      ),
      body,
      origin: fc.oneof(
        { weight: 5, arbitrary: fc.constant(origin) },
        { weight: 1, arbitrary: fc.constantFrom('http://evil.example', 'null') },
      ),
    })
    .map(({ template, segments, query: q, wrongMethod, contentType, body: b, origin: o }) => {
      let i = 0;
      const method = wrongMethod ?? template.methods[0];
      const path = template.path.replace(/:\w+/g, () => segments[i++]) + q;
      const headers: Record<string, string> = { origin: o };
      if (contentType) headers['content-type'] = contentType.replace(/\u0000/g, '');
      const hasBody = method !== 'GET' && method !== 'HEAD';
      return { method, path, headers, ...(hasBody ? { body: b } : {}) };
    });
}

export type FuzzTotals = {
  sent: number;
  byStatus: Record<number, number>;
  serverErrors: { request: FuzzRequest; status: number; text: string }[];
  /** Writes (POST, PUT, PATCH, DELETE) that were not refused: none is expected from fuzzed input. */
  acceptedWrites: FuzzRequest[];
};

/** Sends `runs` generated requests (a fixed seed makes the run repeatable), a few at a time. */
export async function fuzz(options: {
  baseURL: string;
  cookie: string;
  runs: number;
  seed: number;
  concurrency?: number;
}): Promise<FuzzTotals> {
  const list = fc.sample(requests(options.baseURL), { numRuns: options.runs, seed: options.seed });
  const totals: FuzzTotals = { sent: 0, byStatus: {}, serverErrors: [], acceptedWrites: [] };
  let next = 0;
  async function worker() {
    while (next < list.length) {
      const req = list[next++];
      const res = await fetch(options.baseURL + req.path, {
        method: req.method,
        headers: { ...req.headers, cookie: options.cookie },
        body: req.body,
        redirect: 'manual',
      });
      const text = await res.text();
      totals.sent++;
      totals.byStatus[res.status] = (totals.byStatus[res.status] ?? 0) + 1;
      if (res.status >= 500)
        totals.serverErrors.push({ request: req, status: res.status, text: text.slice(0, 300) });
      if (['POST', 'PUT', 'PATCH', 'DELETE'].includes(req.method) && res.status < 300)
        totals.acceptedWrites.push(req);
    }
  }
  await Promise.all(Array.from({ length: options.concurrency ?? 4 }, worker));
  return totals;
}

export function describeTotals(t: FuzzTotals, seed: number): string {
  const statuses = Object.entries(t.byStatus)
    .map(([s, n]) => `${s}×${n}`)
    .join(' ');
  return `fuzz: seed ${seed}, ${t.sent} requests, ${t.serverErrors.length} answered 5xx, ${t.acceptedWrites.length} writes accepted; statuses ${statuses}`;
}
