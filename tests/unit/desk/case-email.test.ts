import { describe, expect, it } from 'vitest';
import { caseEmailFacts, decisionEmail, notifyEmail } from '@/lib/desk/case-email';

const facts = caseEmailFacts(
  {
    unitNumber: 'R53017',
    terminalName: 'Riverbend terminal',
    carrierName: 'Osterlind Freightways',
    timeZone: 'America/Chicago',
    occurredAt: new Date('2026-10-23T14:30:00Z'),
  },
  [
    {
      itemKey: 'left_side.skin',
      previousCondition: 'ok',
      condition: 'damaged',
      reason: 'Inspected ok at the hook, damaged at the drop.',
    },
  ],
  85_000,
);

describe('case e-mails', () => {
  it('tell the carrier the items, the estimate, the deadline in the terminal time and the link', () => {
    const mail = notifyEmail(facts, new Date('2026-11-07T16:00:00Z'), 'https://hm.example/case-link/abc');
    expect(mail.subject).toBe('Damage case for trailer R53017 at Riverbend terminal');
    expect(mail.text).toContain('- Left side skin: ok → damaged (needs repair)');
    expect(mail.text).toContain('Repair estimate: $850.00.');
    // IANA tz database: US daylight saving time ends 1 Nov 2026, so 16:00 UTC on 7 Nov is 10:00 CST
    expect(mail.text).toContain('until Nov 7, 2026, 10:00 CST (America/Chicago)');
    // and 14:30 UTC on 23 Oct is 09:30 CDT
    expect(mail.text).toContain('on Oct 23, 2026, 09:30 CDT.');
    expect(mail.text).toContain('Evidence and dispute form: https://hm.example/case-link/abc');
  });

  it('tell the decision and the amount charged', () => {
    const mail = decisionEmail(facts, 'share', 42_500, 'The hook photo is unclear; we split the repair.');
    expect(mail.text).toContain('is decided: shared: part of the repair is charged to your company.');
    expect(mail.text).toContain('Repair estimate: $850.00. Charged to your company: $425.00.');
    expect(mail.text).toContain('Reason: The hook photo is unclear; we split the repair.');
  });
});

describe('case e-mails in the carrier contact’s language', () => {
  const es = caseEmailFacts(
    {
      unitNumber: 'R53017',
      terminalName: 'Riverbend terminal',
      carrierName: 'Vantorra Haulage',
      timeZone: 'America/Chicago',
      occurredAt: new Date('2026-10-23T14:30:00Z'),
    },
    [
      {
        itemKey: 'left_side.skin',
        previousCondition: 'ok',
        condition: 'damaged',
        reason: 'Inspected ok at the hook, damaged at the drop.',
      },
    ],
    85_000,
    'es',
  );

  it('writes the notice in Spanish, item and conditions included, times in the terminal zone', () => {
    const mail = notifyEmail(es, new Date('2026-11-07T16:00:00Z'), 'https://hm.example/case-link/abc');
    expect(mail.subject).toBe('Caso de daño de la caja R53017 en Riverbend terminal');
    expect(mail.text).toContain('- Lámina del lado izquierdo: bien → con daño (necesita reparación)');
    expect(mail.text).toContain('Estimado de reparación: $850.00.');
    // IANA tz database: 16:00 UTC on 7 Nov 2026 is 10:00 in Chicago (standard time since 1 Nov)
    expect(mail.text).toMatch(/hasta el 7 nov 2026, 10:00 \S+ \(America\/Chicago\)/);
    expect(mail.text).not.toContain('Repair estimate');
  });

  it('writes the decision in Spanish', () => {
    const mail = decisionEmail(es, 'absorb', 0, 'Daño de la terminal.');
    expect(mail.subject).toBe('Decisión sobre el caso de daño de la caja R53017');
    expect(mail.text).toContain('está decidido: lo absorbe la terminal: no se cobra nada a su empresa.');
    expect(mail.text).toContain('Cobrado a su empresa: $0.00.');
  });
});
