import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/app/_components/empty-state';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { formatTime } from '@/lib/format/time';
import { requireUser } from '@/lib/server/auth';
import { checkTerminalAnchors } from '@/lib/server/jobs/anchor';

export const metadata: Metadata = { title: 'Record anchors' };

const WHY = {
  head_missing: 'its anchored record is gone',
  head_changed: 'its anchored record now has another hash',
  count_changed: 'a different number of records now leads to it',
  chain_broken: 'the records leading to it no longer verify',
} as const;

/**
 * The terminal's daily anchors (newest first), each checked against the records as stored now.
 * The digest here must equal the one in the e-mail the manager received for that day.
 */
export default async function AnchorsPage() {
  const user = await requireUser(SECTION_ROLES.admin);
  const zone = user.terminalTimeZone ?? 'UTC';
  const anchors = user.terminalId ? await checkTerminalAnchors(user.terminalId) : [];
  return (
    <div className="space-y-4">
      <h1 className="text-gate-xl font-bold">Record anchors · {user.terminalName ?? 'no home terminal'}</h1>
      <p className="text-gate">
        Once a day, after the terminal&apos;s midnight, Hitchmark fixes the last record of every
        trailer&apos;s chain in one digest and e-mails it to the terminal&apos;s managers. Compare the digest
        below with that e-mail: if they differ, or a check below fails, records were rewritten after that day.
      </p>
      {anchors.length === 0 ? (
        <EmptyState title="No anchors yet">
          The first is made after the terminal&apos;s next midnight.
        </EmptyState>
      ) : (
        <ul className="space-y-2" aria-label="Anchors">
          {anchors.map((a) => (
            <li
              key={a.id}
              data-day={a.day}
              className={`rounded-lg border-l-8 bg-paper p-3 ${a.check.ok ? 'border-ok' : 'border-danger'}`}
            >
              <p className="text-gate font-bold">
                {a.day} · {a.heads.length} trailers · {a.recordCount} records
              </p>
              <p className="break-all font-mono text-gate-sm">{a.digest}</p>
              <p className="text-gate-sm text-ink-soft">
                anchored {formatTime(a.createdAt, zone)} · e-mailed to{' '}
                {a.emailedTo.length ? a.emailedTo.join(', ') : 'nobody (no manager with an e-mail)'}
              </p>
              {a.check.ok ? (
                <p role="status" className="text-gate font-bold text-ok">
                  The records as stored now still lead to this anchor.
                </p>
              ) : (
                <div role="alert" className="text-gate font-bold text-danger">
                  <p>
                    The records as stored now do NOT lead to this anchor
                    {a.check.digestMatches ? '' : ' (the digest differs)'}.
                  </p>
                  <ul className="list-disc pl-6 text-gate-sm">
                    {a.check.problems.map((p) => (
                      <li key={p.trailerId}>
                        Trailer{' '}
                        <Link href={`/trailers/${p.trailerId}`} className="underline">
                          {p.trailerId.slice(0, 8)}
                        </Link>
                        : {WHY[p.why]}
                      </li>
                    ))}
                  </ul>
                </div>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
