// The unchanged path at a person's pace (not a timed test). Reads the taps and typed characters
// that tests/e2e/gate-taps.spec.ts counted (.data/gate-taps.json) and prints the seconds a driver
// would take: 1.5 s per tap (a look, a reach, a tap with gloves), typing at 2 characters a second
// on a phone keyboard, and 1 s to bring up the keyboard for each typed field (figures from memory,
// kept slow on purpose). Run: `bash scripts/test.sh gate-taps` (or the spec alone), then
// `npx tsx scripts/gate-pace.ts`.
import { readFileSync } from 'node:fs';

const SECONDS_PER_TAP = 1.5;
const CHARS_PER_SECOND = 2;
const SECONDS_PER_TYPED_FIELD = 1;
const LIMIT_SECONDS = 45;

type Path = { taps: number; chars: number; typedFields: number };
const file = '.data/gate-taps.json';
let data: { unit: string; drop: Path; hook: Path };
try {
  data = JSON.parse(readFileSync(file, 'utf8'));
} catch {
  console.error(`No ${file}: run the tap-count spec first (tests/e2e/gate-taps.spec.ts).`);
  process.exit(1);
}

const seconds = (p: Path) =>
  p.taps * SECONDS_PER_TAP + p.chars / CHARS_PER_SECOND + p.typedFields * SECONDS_PER_TYPED_FIELD;

console.log(
  `Unchanged path for ${data.unit}, scan to receipt, at ${SECONDS_PER_TAP} s per tap and ${CHARS_PER_SECOND} characters a second:`,
);
for (const kind of ['drop', 'hook'] as const) {
  const p = data[kind];
  const s = seconds(p);
  console.log(
    `  ${kind}: ${p.taps} taps, ${p.chars} characters in ${p.typedFields} fields → ${s.toFixed(1)} s ` +
      `(${s <= LIMIT_SECONDS ? 'within' : 'OVER'} ${LIMIT_SECONDS} s)`,
  );
}
