// Helpers of the bulk generator: deterministic random numbers, verification codes, and a buffer
// of rows written with PostgreSQL COPY (text format) in one round trip per flush.
import type pg from 'pg';
import { from as copyFrom } from 'pg-copy-streams';
import { pipeline } from 'node:stream/promises';
import { Readable } from 'node:stream';
import { CROCKFORD } from '@/lib/handoffs/verification-code';

/** Deterministic pseudo-random numbers (mulberry32), so two runs make the same shapes. */
export function random(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A unique 8-character Crockford code per sequence number (an odd multiplier mod 2^40 is a bijection). */
export function codeFor(seq: number): string {
  let v = (BigInt(seq) * 0x9e3779b97fn + 0x5bd1e995n) & 0xffffffffffn;
  let out = '';
  for (let i = 0; i < 8; i++) {
    out = CROCKFORD[Number(v & 31n)] + out;
    v >>= 5n;
  }
  return out;
}

/** One value in PostgreSQL's COPY text format (PostgreSQL documentation, "COPY", text format). */
function cell(v: unknown): string {
  if (v === null || v === undefined) return '\\N';
  if (v instanceof Date) return v.toISOString();
  if (typeof v === 'number' || typeof v === 'boolean') return String(v);
  const s = typeof v === 'object' ? JSON.stringify(v) : String(v);
  return /[\\\t\n\r]/.test(s)
    ? s.replace(/\\/g, '\\\\').replace(/\t/g, '\\t').replace(/\n/g, '\\n').replace(/\r/g, '\\r')
    : s;
}

export class CopyBuffer {
  private lines: string[] = [];
  total = 0;
  constructor(
    readonly table: string,
    readonly columns: string[],
  ) {}
  get size() {
    return this.lines.length;
  }
  push(values: unknown[]) {
    this.lines.push(values.map(cell).join('\t') + '\n');
  }
  async flush(client: pg.Client) {
    if (!this.lines.length) return;
    const chunks = this.lines;
    this.lines = [];
    this.total += chunks.length;
    const sql = `COPY ${this.table} (${this.columns.join(', ')}) FROM STDIN`;
    await pipeline(Readable.from(chunkJoin(chunks)), client.query(copyFrom(sql)));
  }
}

function* chunkJoin(lines: string[]) {
  for (let i = 0; i < lines.length; i += 2000) yield lines.slice(i, i + 2000).join('');
}
