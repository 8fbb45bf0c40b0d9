import { describe, expect, it } from 'vitest';
import { slotFlags } from '@/lib/yard/map-signal';
import type { BoardTrailer } from '@/lib/yard/types';

const policy = { freeTimeHours: 48, lowFuelEighths: 2 };
const trailer = (p: Partial<BoardTrailer>): BoardTrailer => ({
  id: 't1',
  unitNumber: 'R10001',
  kind: 'reefer',
  isLoaded: true,
  isReeferOn: true,
  setpointTenthsF: 340,
  fuelEighths: 8,
  gateInAt: null,
  lastSeenAt: null,
  holds: [],
  ...p,
});
const oos = { severity: 'out_of_service' as const, reason: 'Pin not engaged.' };
const restricted = { severity: 'restricted' as const, reason: 'Hinge does not lock.' };

describe('yard map: out of service is the strongest signal, in words as well as colour', () => {
  it('out of service takes the tone over a loaded reefer that is off and low on fuel, and its words come first', () => {
    const f = slotFlags(trailer({ holds: [restricted, oos], isReeferOn: false, fuelEighths: 1 }), policy);
    expect(f.tone).toBe('out_of_service');
    expect(f.words).toEqual(['OUT OF SERVICE', 'REEFER OFF', 'FUEL 1/8']);
  });

  it('a restricted trailer says RESTRICTED, never the out-of-service words or tone', () => {
    const f = slotFlags(trailer({ holds: [restricted] }), policy);
    expect(f).toEqual({ tone: 'restricted', words: ['RESTRICTED'] });
  });

  it('a loaded reefer with its unit off outranks a restriction; an empty one off is not flagged (common practice)', () => {
    expect(slotFlags(trailer({ holds: [restricted], isReeferOn: false }), policy).tone).toBe('reefer_off');
    expect(slotFlags(trailer({ isLoaded: false, isReeferOn: false }), policy)).toEqual({
      tone: null,
      words: [],
    });
  });

  it('low fuel is flagged at the policy eighths and not above', () => {
    expect(slotFlags(trailer({ fuelEighths: 2 }), policy)).toEqual({ tone: 'low_fuel', words: ['FUEL 2/8'] });
    expect(slotFlags(trailer({ fuelEighths: 3 }), policy).tone).toBeNull();
  });
});
