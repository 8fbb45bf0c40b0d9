import { describe, expect, it } from 'vitest';
import { newDraft, type Draft } from '@/lib/handoffs/draft';
import {
  errorsByField,
  firstStepWithError,
  gateSteps,
  isStepComplete,
  nextStep,
  stepOfField,
  type StepContext,
} from '@/lib/handoffs/steps';

const ctx: StepContext = {
  isReefer: true,
  asksPerishable: false,
  safetyKeys: ['undercarriage.tandem.pin_lr', 'tires.axle1.left_outer'],
  otherKeys: ['left_side.skin', 'interior.floor'],
};
const draft = (p: Partial<Draft> = {}): Draft => ({
  ...newDraft({
    idempotencyKey: 'k'.repeat(20),
    trailerId: '00000000-0000-4000-8000-000000000001',
    kind: 'drop',
    carrierId: '00000000-0000-4000-8000-000000000002',
    driverName: 'Ines Varga',
  }),
  ...p,
});

describe('gate form steps', () => {
  it('has fuel and reefer readings for a reefer only', () => {
    expect(gateSteps(true)).toEqual(['who', 'fuel', 'reefer', 'safety', 'rest', 'confirm']);
    expect(gateSteps(false)).toEqual(['who', 'safety', 'rest', 'confirm']);
  });

  it('finds "who and what" answered only with a tractor and loaded or empty', () => {
    expect(isStepComplete('who', draft(), ctx)).toBe(false);
    expect(isStepComplete('who', draft({ tractorNumber: 'T-12' }), ctx)).toBe(false);
    expect(isStepComplete('who', draft({ tractorNumber: 'T-12', isLoaded: false }), ctx)).toBe(true);
    // a "no perishable loads" hook also needs the perishable answer, false counting as an answer
    const asks = { ...ctx, asksPerishable: true };
    expect(isStepComplete('who', draft({ tractorNumber: 'T-12', isLoaded: true }), asks)).toBe(false);
    expect(
      isStepComplete('who', draft({ tractorNumber: 'T-12', isLoaded: true, isLoadPerishable: false }), asks),
    ).toBe(true);
  });

  it('needs the pre-trip time unless the pre-trip was not run', () => {
    const reefer = draft().reefer;
    expect(isStepComplete('reefer', draft({ reefer: { ...reefer, preTripResult: 'pass' } }), ctx)).toBe(
      false,
    );
    expect(
      isStepComplete(
        'reefer',
        draft({ reefer: { ...reefer, preTripResult: 'pass', preTripAt: '2026-12-02T06:30' } }),
        ctx,
      ),
    ).toBe(true);
    expect(isStepComplete('reefer', draft({ reefer: { ...reefer, preTripResult: 'not_run' } }), ctx)).toBe(
      true,
    );
  });

  it('counts the safety step answered only when every safety item has a condition', () => {
    const one = draft({ items: { 'undercarriage.tandem.pin_lr': { condition: 'ok', isEngaged: true } } });
    expect(isStepComplete('safety', one, ctx)).toBe(false);
    expect(isStepComplete('rest', one, ctx)).toBe(false);
    const both = draft({
      items: {
        ...one.items,
        'tires.axle1.left_outer': { condition: 'ok', treadThirtySeconds: 9, isHoldingAir: true },
      },
    });
    expect(isStepComplete('safety', both, ctx)).toBe(true);
    expect(isStepComplete('confirm', both, ctx)).toBe(false);
  });

  it('sends each field to its step, items by whether they are safety items', () => {
    expect(stepOfField('tractorNumber', ctx)).toBe('who');
    expect(stepOfField('fuelEighths', ctx)).toBe('fuel');
    expect(stepOfField('reefer.engineHours', ctx)).toBe('reefer');
    expect(stepOfField('items.tires.axle1.left_outer.treadThirtySeconds', ctx)).toBe('safety');
    expect(stepOfField('items.left_side.skin', ctx)).toBe('rest');
    expect(stepOfField('note', ctx)).toBe('confirm');
  });

  it('opens the first step, in form order, that holds a message', () => {
    const steps = gateSteps(true);
    // engine hours -5 and an over-long note: the reefer step comes before the confirmation
    expect(firstStepWithError(steps, { note: ['too long'], 'reefer.engineHours': ['negative'] }, ctx)).toBe(
      'reefer',
    );
    expect(firstStepWithError(steps, { note: ['too long'] }, ctx)).toBe('confirm');
    expect(firstStepWithError(steps, { note: [] }, ctx)).toBeNull();
  });

  it('files a server message on an item field under the item and drops the bare summaries', () => {
    const out = errorsByField(
      {
        items: ['Give the tread depth in 32nds of an inch.'],
        'items.tires.axle1.left_outer.treadThirtySeconds': ['Give the tread depth in 32nds of an inch.'],
        reefer: ['Engine hours cannot be negative.'],
        'reefer.engineHours': ['Engine hours cannot be negative.'],
      },
      [...ctx.safetyKeys, ...ctx.otherKeys],
    );
    expect(out).toEqual({
      'items.tires.axle1.left_outer': ['Give the tread depth in 32nds of an inch.'],
      'reefer.engineHours': ['Engine hours cannot be negative.'],
    });
  });

  it('moves to the next step and stays on the last', () => {
    const steps = gateSteps(false);
    expect(nextStep(steps, 'who')).toBe('safety');
    expect(nextStep(steps, 'confirm')).toBe('confirm');
  });
});
