import { ButtonLink } from '@/app/_components/button';
import { CAUTIONS, Caution } from '@/app/_components/caution';
import { HOLD_WORDS, RESTRICTION_WORDS } from '@/lib/handoffs/receipt';

type HoldRow = {
  id: string;
  severity: 'out_of_service' | 'restricted';
  restriction: string | null;
  reason: string;
  caution?: string | null;
};

export function HoldList({ title, holds }: { title: string; holds: HoldRow[] }) {
  return (
    <section aria-label={title} className="rounded-lg border-2 border-hold bg-hold-bg p-3 text-hold">
      <h2 className="text-gate-lg font-bold">{title}</h2>
      <ul className="mt-1 list-disc space-y-1 pl-6 text-gate">
        {holds.map((h) => (
          <li key={h.id}>
            {h.severity === 'restricted' && h.restriction
              ? `${RESTRICTION_WORDS[h.restriction] ?? h.restriction}: `
              : ''}
            {h.reason}
            {h.caution ? <p className="mt-1 text-gate-sm text-ink">⚠ {h.caution}</p> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}

/** A hook of an out-of-service or "yard moves only" trailer stops here, before the form. */
export function HookRefused({ unitNumber, holds }: { unitNumber: string; holds: HoldRow[] }) {
  const isOutOfService = holds.some((h) => h.severity === 'out_of_service');
  return (
    <div className="space-y-3" role="alert">
      <div className="rounded-lg border-4 border-danger bg-danger-bg p-3 text-danger">
        <p className="text-gate-xl font-bold">Hook refused</p>
        <p className="text-gate font-bold">
          Trailer {unitNumber} is{' '}
          {isOutOfService
            ? HOLD_WORDS.out_of_service.toLowerCase()
            : `restricted to ${RESTRICTION_WORDS.yard_only}: it may not leave the gate`}
          .
        </p>
      </div>
      <HoldList title="Why" holds={holds} />
      {isOutOfService ? (
        <Caution title="Out of service">{CAUTIONS.outOfService}</Caution>
      ) : (
        <Caution title="Yard moves only">{CAUTIONS.yardOnly}</Caution>
      )}
      <Caution title="Your inspection">{CAUTIONS.inspection}</Caution>
      <p className="text-gate">
        Ask the terminal clerk for another trailer. A clerk releases the hold once the repair is recorded.
      </p>
      <ButtonLink href="/gate" variant="secondary" className="w-full">
        Back to the gate
      </ButtonLink>
    </div>
  );
}
