import { describe, expect, it } from 'vitest';
import { anchorEmail } from '@/lib/handoffs/anchor-email';

// Invented terminal and digest.
const facts = {
  id: '0d6f2c1a-5b3e-4f7a-9c8d-1e2f3a4b5c6d',
  terminal: { code: 'RVB', name: 'Riverbend terminal' },
  day: '2026-11-01',
  digest: 'c0ffee'.repeat(10) + 'abcd',
  trailers: 12,
  records: 40,
  url: 'https://hm.example/admin/anchors',
};

describe('anchor digest e-mail', () => {
  it('is written in each manager’s language and always carries the full digest', () => {
    const en = anchorEmail('en', facts);
    const es = anchorEmail('es', facts);
    expect(en.subject).toBe(`Hitchmark chain anchor RVB 2026-11-01: ${facts.digest.slice(0, 16)}`);
    expect(es.subject).toBe(`Ancla de la cadena de Hitchmark RVB 2026-11-01: ${facts.digest.slice(0, 16)}`);
    expect(es.text).toContain('Resumen (SHA-256 sobre 12 cadenas de cajas, 40 registros de entrega):');
    expect(es.text).not.toContain('Keep this e-mail');
    for (const m of [en, es]) {
      expect(m.text.split('\n')).toContain(facts.digest);
      expect(m.relatedId).toBe(facts.id);
    }
  });
});
