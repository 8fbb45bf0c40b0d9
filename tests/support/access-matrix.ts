// The access matrix: every page, route handler and server action of the app × every kind of
// visitor, with the answer each must get. tests/unit/access-matrix.test.ts checks that every
// page.tsx, route.ts export and exported server action has a row here; tests/e2e/access-matrix.spec.ts
// sends each page and route cell over HTTP to `next start`, and tests/unit/db/action-access.test.ts
// calls each action as each visitor.
//
// Visitors: no session; a driver of the carrier that owns the record (D2001, whose carrier has
// cases and photos in the demo seed); a driver of another carrier (D1001); the jockey; the clerk;
// the admin (all from the demo seed).

export const VISITORS = ['none', 'driverOwn', 'driverOther', 'jockey', 'clerk', 'admin'] as const;
export type Visitor = (typeof VISITORS)[number];

/** The seeded account (e-mail or driver number) each signed-in visitor is. */
export const VISITOR_ACCOUNTS: Record<Exclude<Visitor, 'none'>, string> = {
  driverOwn: 'D2001',
  driverOther: 'D1001',
  jockey: 'jockey@bramblecrest.example',
  clerk: 'clerk@bramblecrest.example',
  admin: 'admin@bramblecrest.example',
};
export type Expect = Record<Visitor, number>;

/** Records of the seeded e2e database the URLs point at (found by the spec at run time). */
export type Ids = {
  receiptId: string; // a handoff of the owning carrier
  caseId: string; // a damage case on a handoff of the owning carrier
  photoId: string; // a stored photo of a handoff of the owning carrier
  trailerId: string;
  walkId: string; // a yard walk at the home terminal
  verificationCode: string;
  labelToken: string;
  caseLinkToken: string;
  unknownId: string; // a uuid no record has
};

const REDIRECT = 307; // proxy.ts (no cookie) or redirect() on the page
const FORBIDDEN = 403;
const NOT_FOUND = 404;
const OK = 200;

/** A section of signed-in roles: allowed roles get `ok`, others 403; no session is sent to sign in. */
function only(allowed: Exclude<Visitor, 'none'>[], ok = OK, none = REDIRECT): Expect {
  const e = { none } as Expect;
  for (const v of VISITORS) if (v !== 'none') e[v] = allowed.includes(v) ? ok : FORBIDDEN;
  return e;
}
const all = (status: number): Expect => Object.fromEntries(VISITORS.map((v) => [v, status])) as Expect;
const DRIVERS = ['driverOwn', 'driverOther'] as const;
const GATE = [...DRIVERS, 'clerk', 'admin'] as Exclude<Visitor, 'none'>[];
const YARD: Exclude<Visitor, 'none'>[] = ['jockey', 'clerk', 'admin'];
const DESK = GATE;
const DESK_STAFF: Exclude<Visitor, 'none'>[] = ['clerk', 'admin'];
const TRAILERS = YARD;
const EVERY_ROLE: Exclude<Visitor, 'none'>[] = ['driverOwn', 'driverOther', 'jockey', 'clerk', 'admin'];

export type PageRow = { file: string; url: (ids: Ids) => string; expect: Expect; note?: string };
export type RouteRow = {
  file: string;
  method: 'GET' | 'POST';
  url: (ids: Ids) => string;
  /** JSON body for writes: `{}` asks for the field checks (422) once access is granted. */
  body?: unknown;
  expect: Expect;
};
export type ActionRow = {
  file: string;
  name: string;
  /** 'signin' = sent to sign in, 'forbidden' = 403, 'form' = let in (answers the form). */
  expect: Record<Visitor, 'signin' | 'forbidden' | 'form'>;
};

export const PAGES: PageRow[] = [
  { file: 'app/page.tsx', url: () => '/', expect: all(REDIRECT) },
  { file: 'app/(auth)/login/page.tsx', url: () => '/login', expect: { ...all(REDIRECT), none: OK } },
  { file: 'app/verify/page.tsx', url: (i) => `/verify?code=${i.verificationCode}`, expect: all(OK) },
  { file: 'app/case-link/[token]/page.tsx', url: (i) => `/case-link/${i.caseLinkToken}`, expect: all(OK) },
  {
    file: 'app/case-link/[token]/page.tsx',
    url: () => '/case-link/not-a-real-link-token',
    expect: all(NOT_FOUND),
    note: 'a forged link',
  },
  { file: 'app/(app)/account/page.tsx', url: () => '/account', expect: only(EVERY_ROLE) },
  { file: 'app/(app)/admin/page.tsx', url: () => '/admin', expect: only(['admin']) },
  { file: 'app/(app)/admin/rates/page.tsx', url: () => '/admin/rates', expect: only(['admin']) },
  { file: 'app/(app)/admin/yard/page.tsx', url: () => '/admin/yard', expect: only(['admin']) },
  { file: 'app/(app)/admin/anchors/page.tsx', url: () => '/admin/anchors', expect: only(['admin']) },
  { file: 'app/(app)/desk/page.tsx', url: () => '/desk', expect: only(DESK) },
  { file: 'app/(app)/desk/reports/page.tsx', url: () => '/desk/reports', expect: only(DESK_STAFF) },
  {
    file: 'app/(app)/desk/cases/[id]/page.tsx',
    url: (i) => `/desk/cases/${i.caseId}`,
    expect: { ...only(DESK), driverOther: NOT_FOUND },
    note: "another carrier's case is not found",
  },
  {
    file: 'app/(app)/desk/cases/[id]/page.tsx',
    url: (i) => `/desk/cases/${i.unknownId}`,
    expect: only(DESK, NOT_FOUND),
    note: 'an unknown case',
  },
  { file: 'app/(app)/gate/page.tsx', url: () => '/gate', expect: only(GATE) },
  {
    file: 'app/(app)/gate/receipts/[id]/page.tsx',
    url: (i) => `/gate/receipts/${i.receiptId}`,
    expect: { ...only(GATE), driverOther: NOT_FOUND },
    note: "another carrier's receipt is not found",
  },
  {
    file: 'app/(app)/gate/receipts/[id]/page.tsx',
    url: (i) => `/gate/receipts/${i.unknownId}`,
    expect: only(GATE, NOT_FOUND),
  },
  {
    file: 'app/(app)/gate/trailers/[id]/page.tsx',
    url: (i) => `/gate/trailers/${i.trailerId}`,
    expect: only(GATE),
  },
  {
    file: 'app/(app)/gate/trailers/[id]/page.tsx',
    url: (i) => `/gate/trailers/${i.unknownId}`,
    expect: only(GATE, NOT_FOUND),
  },
  { file: 'app/(app)/l/[token]/page.tsx', url: (i) => `/l/${i.labelToken}`, expect: all(REDIRECT) },
  { file: 'app/(app)/trailers/page.tsx', url: () => '/trailers', expect: only(TRAILERS) },
  { file: 'app/(app)/trailers/labels/page.tsx', url: () => '/trailers/labels', expect: only(TRAILERS) },
  {
    file: 'app/(app)/trailers/[id]/page.tsx',
    url: (i) => `/trailers/${i.trailerId}`,
    expect: only(TRAILERS),
  },
  {
    file: 'app/(app)/trailers/[id]/page.tsx',
    url: (i) => `/trailers/${i.unknownId}`,
    expect: only(TRAILERS, NOT_FOUND),
  },
  {
    file: 'app/(app)/trailers/[id]/label/page.tsx',
    url: (i) => `/trailers/${i.trailerId}/label`,
    expect: only(TRAILERS),
  },
  { file: 'app/(app)/yard/page.tsx', url: () => '/yard', expect: only(YARD) },
  { file: 'app/(app)/yard/moves/page.tsx', url: () => '/yard/moves', expect: only(YARD) },
  { file: 'app/(app)/yard/tasks/page.tsx', url: () => '/yard/tasks', expect: only(YARD) },
  { file: 'app/(app)/yard/walks/page.tsx', url: () => '/yard/walks', expect: only(YARD) },
  { file: 'app/(app)/yard/walks/[id]/page.tsx', url: (i) => `/yard/walks/${i.walkId}`, expect: only(YARD) },
  {
    file: 'app/(app)/yard/walks/[id]/page.tsx',
    url: (i) => `/yard/walks/${i.unknownId}`,
    expect: only(YARD, NOT_FOUND),
    note: 'an unknown walk',
  },
];

const API = 401; // route handlers answer a missing session with 401, not a redirect

export const ROUTES: RouteRow[] = [
  { file: 'app/api/health/route.ts', method: 'GET', url: () => '/api/health', expect: all(OK) },
  {
    file: 'app/api/verify/[code]/route.ts',
    method: 'GET',
    url: (i) => `/api/verify/${i.verificationCode}`,
    expect: all(OK),
  },
  {
    file: 'app/api/yard/board/route.ts',
    method: 'GET',
    url: () => '/api/yard/board',
    expect: only(YARD, OK, API),
  },
  {
    file: 'app/api/yard/board.csv/route.ts',
    method: 'GET',
    url: () => '/api/yard/board.csv',
    expect: only(YARD, OK, API),
  },
  {
    file: 'app/api/yard/moves/route.ts',
    method: 'POST',
    url: () => '/api/yard/moves',
    body: {},
    expect: only(YARD, 422, API),
  },
  {
    file: 'app/api/yard/walks/[id]/scans/route.ts',
    method: 'POST',
    url: (i) => `/api/yard/walks/${i.walkId}/scans`,
    body: {},
    expect: only(YARD, 422, API),
  },
  {
    file: 'app/api/handoffs/route.ts',
    method: 'POST',
    url: () => '/api/handoffs',
    body: {},
    expect: only(GATE, 422, API),
  },
  {
    file: 'app/api/uploads/route.ts',
    method: 'POST',
    url: () => '/api/uploads',
    body: {},
    expect: only(GATE, 422, API),
  },
  {
    file: 'app/api/uploads/[id]/complete/route.ts',
    method: 'POST',
    url: (i) => `/api/uploads/${i.unknownId}/complete`,
    expect: only(GATE, NOT_FOUND, API),
  },
  {
    file: 'app/api/desk/reports.csv/route.ts',
    method: 'GET',
    url: () => '/api/desk/reports.csv',
    expect: only(DESK_STAFF, OK, API),
  },
  {
    file: 'app/api/trailers/route.ts',
    method: 'GET',
    url: () => '/api/trailers',
    expect: only(TRAILERS, OK, API),
  },
  {
    file: 'app/api/trailers/[id]/condition/route.ts',
    method: 'GET',
    url: (i) => `/api/trailers/${i.trailerId}/condition`,
    expect: only(EVERY_ROLE, OK, API),
  },
  {
    file: 'app/api/trailers/lookup/route.ts',
    method: 'GET',
    url: (i) => `/api/trailers/lookup?token=${i.labelToken}`,
    expect: only(EVERY_ROLE, OK, API),
  },
  {
    file: 'app/api/photos/[id]/route.ts',
    method: 'GET',
    url: (i) => `/api/photos/${i.photoId}`,
    expect: { ...only(EVERY_ROLE, OK, API), driverOther: NOT_FOUND },
  },
  {
    file: 'app/(app)/trailers/labels/pdf/route.ts',
    method: 'GET',
    url: (i) => `/trailers/labels/pdf?ids=${i.trailerId}`,
    expect: only(TRAILERS, OK),
  },
  {
    file: 'app/(app)/gate/receipts/[id]/pdf/route.ts',
    method: 'GET',
    url: (i) => `/gate/receipts/${i.receiptId}/pdf`,
    expect: { ...only(GATE, OK), driverOther: NOT_FOUND },
  },
];

const act = (allowed: Exclude<Visitor, 'none'>[]): ActionRow['expect'] => {
  const e = { none: 'signin' } as ActionRow['expect'];
  for (const v of VISITORS) if (v !== 'none') e[v] = allowed.includes(v) ? 'form' : 'forbidden';
  return e;
};
const every = (answer: 'signin' | 'form') =>
  Object.fromEntries(VISITORS.map((v) => [v, answer])) as ActionRow['expect'];
const ADMIN: Exclude<Visitor, 'none'>[] = ['admin'];

export const ACTIONS: ActionRow[] = [
  { file: 'app/(auth)/actions.ts', name: 'signInAction', expect: every('form') },
  // everyone, signed in or not, ends on the sign-in page
  { file: 'app/(app)/_components/sign-out-action.ts', name: 'signOutAction', expect: every('signin') },
  { file: 'app/(app)/account/actions.ts', name: 'changePinAction', expect: act([...DRIVERS]) },
  { file: 'app/(app)/account/actions.ts', name: 'changePasswordAction', expect: act(YARD) },
  { file: 'app/(app)/account/actions.ts', name: 'changeEmailAction', expect: act([...DRIVERS]) },
  { file: 'app/(app)/admin/actions.ts', name: 'changeUserAccessAction', expect: act(ADMIN) },
  { file: 'app/(app)/admin/rates/actions.ts', name: 'addRateAction', expect: act(ADMIN) },
  { file: 'app/(app)/admin/rates/actions.ts', name: 'changeRateAction', expect: act(ADMIN) },
  { file: 'app/(app)/admin/yard/actions.ts', name: 'createRowAction', expect: act(ADMIN) },
  { file: 'app/(app)/admin/yard/actions.ts', name: 'renameRowAction', expect: act(ADMIN) },
  { file: 'app/(app)/admin/yard/actions.ts', name: 'createSpotAction', expect: act(ADMIN) },
  { file: 'app/(app)/admin/yard/actions.ts', name: 'renameSpotAction', expect: act(ADMIN) },
  { file: 'app/(app)/admin/yard/actions.ts', name: 'retireSpotAction', expect: act(ADMIN) },
  { file: 'app/(app)/desk/actions.ts', name: 'notifyCaseAction', expect: act(DESK_STAFF) },
  { file: 'app/(app)/desk/actions.ts', name: 'resendEmailAction', expect: act(DESK_STAFF) },
  { file: 'app/(app)/desk/actions.ts', name: 'disputeCaseAction', expect: act(DESK) },
  { file: 'app/(app)/desk/actions.ts', name: 'decideCaseAction', expect: act(DESK_STAFF) },
  { file: 'app/(app)/desk/actions.ts', name: 'overrideEstimateAction', expect: act(DESK_STAFF) },
  { file: 'app/(app)/desk/actions.ts', name: 'closeCaseAction', expect: act(DESK_STAFF) },
  { file: 'app/(app)/trailers/actions.ts', name: 'releaseHoldAction', expect: act(DESK_STAFF) },
  { file: 'app/(app)/trailers/labels/actions.ts', name: 'reissueLabelAction', expect: act(DESK_STAFF) },
  { file: 'app/(app)/yard/tasks/actions.ts', name: 'clearTaskAction', expect: act(YARD) },
  { file: 'app/(app)/yard/walks/actions.ts', name: 'startWalkAction', expect: act(YARD) },
  { file: 'app/(app)/yard/walks/actions.ts', name: 'finishWalkAction', expect: act(YARD) },
  { file: 'app/(app)/yard/walks/actions.ts', name: 'resolveOutcomeAction', expect: act(YARD) },
  // the signed link, not a session, is the permission: everyone reaches the form
  {
    file: 'app/case-link/actions.ts',
    name: 'disputeByLinkAction',
    expect: every('form'),
  },
];

/** Cells of the matrix (rows × visitors), as the tests count them. */
export const CELLS = {
  pages: PAGES.length * VISITORS.length,
  routes: ROUTES.length * VISITORS.length,
  actions: ACTIONS.length * VISITORS.length,
};
