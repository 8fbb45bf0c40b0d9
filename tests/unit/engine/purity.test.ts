// The engine is pure (docs/architecture.md): no clock, env, database or framework imports.
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(__dirname, '../../../lib/engine');

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((d) =>
    d.isDirectory() ? sources(join(dir, d.name)) : d.name.endsWith('.ts') ? [join(dir, d.name)] : [],
  );
}

const files = sources(root).map((f) => ({ path: relative(root, f), text: readFileSync(f, 'utf8') }));

describe('engine purity', () => {
  it('finds the engine sources', () => {
    expect(files.map((f) => f.path)).toContain('compare.ts');
    expect(files.length).toBeGreaterThan(10);
  });

  it.each([
    ['reads the clock', /Date\.now\(|new Date\(\)|performance\.now/],
    ['reads env', /process\.env/],
    ['imports next', /from ['"]next(\/|['"])/],
    ['imports the database', /from ['"](@\/db|\.\.\/\.\.\/db|drizzle-orm|pg)['"/]/],
    ['uses Math.random', /Math\.random/],
  ])('no engine file %s', (_what, pattern) => {
    expect(files.filter((f) => pattern.test(f.text)).map((f) => f.path)).toEqual([]);
  });

  it('only the label-token module imports node:crypto, and the public index does not pull it in', () => {
    expect(files.filter((f) => /from ['"](node:)?crypto['"]/.test(f.text)).map((f) => f.path)).toEqual([
      'identity/label-token.ts',
    ]);
    const barrels = files.filter((f) => f.path === 'index.ts' || f.path === 'identity/index.ts');
    for (const b of barrels) expect(b.text).not.toMatch(/from ['"][^'"]*label-token['"]/);
  });
});
