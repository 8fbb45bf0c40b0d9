import { describe, expect, it } from 'vitest';
import { proposalOf } from '@/lib/desk/case-proposal';

// Invented parties. The engine names the terminal as the holder by the terminal's own name, and a
// carrier by the carrier's name with its id (lib/handoffs/evaluation.ts).
const terminal = { responsibleCarrierName: null, responsibleParty: 'Riverbend terminal' };
const carrier = {
  responsibleCarrierName: 'Osterlind Freightways',
  responsibleParty: 'Osterlind Freightways',
};
const nobody = { responsibleCarrierName: null, responsibleParty: null };

describe('who a case is proposed to', () => {
  it('names the proposed carrier', () => {
    expect(proposalOf('Osterlind Freightways', [carrier])).toEqual({
      kind: 'carrier',
      name: 'Osterlind Freightways',
    });
  });

  it('says the terminal when every finding names the terminal, not "no single carrier"', () => {
    expect(proposalOf(null, [terminal, terminal])).toEqual({ kind: 'terminal', name: 'Riverbend terminal' });
  });

  it('says several parties when the findings name different ones', () => {
    expect(proposalOf(null, [terminal, carrier])).toEqual({
      kind: 'several',
      names: ['Riverbend terminal', 'Osterlind Freightways'],
    });
  });

  it('says not attributed when no finding names anyone (no earlier inspection)', () => {
    expect(proposalOf(null, [nobody])).toEqual({ kind: 'unattributed' });
    expect(proposalOf(null, [])).toEqual({ kind: 'unattributed' });
  });
});
