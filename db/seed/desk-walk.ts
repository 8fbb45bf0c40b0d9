// Walks the desk's demo cases through the desk's own commands: 0 open, 1 notified, 2 disputed,
// 3 charged, 4 shared after a dispute, 5 absorbed without notice, 6 closed, 7 waived.
import type { CaseCommand } from '@/lib/desk/case-state';
import { runCaseCommand, type CaseActor } from '@/lib/server/desk/case-command';

export async function walkDemoCases(
  caseIds: string[],
  clerkId: string,
  driverOf: (i: number) => CaseActor,
  at: (i: number, days: number) => Date,
) {
  const clerk: CaseActor = { id: clerkId, role: 'clerk', carrierId: null };
  const step = async (i: number, command: CaseCommand, days: number, actor: CaseActor = clerk) => {
    if (!caseIds[i]) return;
    const result = await runCaseCommand(
      actor,
      { caseId: caseIds[i], command },
      { now: at(i, days), sendEmail: false },
    );
    // a refused step would leave the demo with fewer states than it promises
    if (!result.ok) throw new Error(`seed: demo case ${i} refused ${command.kind}: ${result.message}`);
  };
  for (const i of [1, 2, 3, 4, 6, 7]) await step(i, { kind: 'notify' }, 0.1);
  await step(
    2,
    {
      kind: 'dispute',
      note: 'Our driver photographed that side at the hook; the tear is not in our pictures.',
    },
    2,
    driverOf(2),
  );
  await step(
    3,
    {
      kind: 'decide',
      decision: 'charge',
      chargedCents: 95_000,
      reason: 'Unit door was ok at the hook and cracked at the drop; no dispute.',
    },
    15,
  );
  await step(4, { kind: 'dispute', note: 'The rail was already dented when we took it.' }, 3, driverOf(4));
  await step(
    4,
    {
      kind: 'decide',
      decision: 'share',
      chargedCents: 42_500,
      reason: 'Hook photo is unclear on the rail; split the repair.',
    },
    6,
  );
  await step(
    5,
    {
      kind: 'decide',
      decision: 'absorb',
      chargedCents: 0,
      reason: 'Yard tractor contact reported by our own jockey.',
    },
    1,
  );
  await step(
    6,
    { kind: 'decide', decision: 'charge', chargedCents: 85_000, reason: 'Clear before and after photos.' },
    15,
  );
  await step(6, { kind: 'close', note: 'Carrier paid.' }, 20);
  await step(
    7,
    {
      kind: 'decide',
      decision: 'waive',
      chargedCents: 0,
      reason: 'Long-standing customer; small repair done in house.',
    },
    5,
  );
}
