// Who a case is proposed to, said so that the header and its findings agree: a carrier, the
// terminal (its own custody: no carrier to charge), several parties, or nobody (no earlier
// inspection to compare with). Pure.
type FindingParty = { responsibleCarrierName: string | null; responsibleParty: string | null };

export type Proposal =
  | { kind: 'carrier'; name: string }
  | { kind: 'terminal'; name: string }
  | { kind: 'several'; names: string[] }
  | { kind: 'unattributed' };

export function proposalOf(proposedCarrierName: string | null, findings: FindingParty[]): Proposal {
  if (proposedCarrierName) return { kind: 'carrier', name: proposedCarrierName };
  const names = [...new Set(findings.flatMap((f) => (f.responsibleParty ? [f.responsibleParty] : [])))];
  if (names.length === 0) return { kind: 'unattributed' };
  const isTerminalOnly =
    names.length === 1 && findings.every((f) => f.responsibleParty === names[0] && !f.responsibleCarrierName);
  return isTerminalOnly ? { kind: 'terminal', name: names[0] } : { kind: 'several', names };
}
