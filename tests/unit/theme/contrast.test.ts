import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { compile } from '@tailwindcss/node';
import Color from 'colorjs.io';
import { describe, expect, it } from 'vitest';
import { AA_NON_TEXT, AA_TEXT, contrastRatio, relativeLuminance } from '@/lib/theme/contrast';
import { STATUS_TONES } from '@/lib/theme/status';

// The tokens as shipped: app/globals.css compiled by Tailwind's compiler (the one the build's
// PostCSS plugin runs), so the numbers checked are the ones drawn. The night values are written
// once, in a variant, and come out twice: for the switch and for the phone's own dark setting.
const source = fileURLToPath(new URL('../../../app/globals.css', import.meta.url));
const compiler = await compile(readFileSync(source, 'utf8'), {
  base: path.dirname(source),
  onDependency: () => undefined,
});
const css = compiler.build([]);

function tokens(selector: string, from = 0): Record<string, string> {
  const at = css.indexOf(selector, from);
  if (at < 0) throw new Error(`no ${selector} block in the compiled globals.css`);
  const body = css.slice(css.indexOf('{', at) + 1, css.indexOf('}', at));
  return Object.fromEntries(
    [...body.matchAll(/--hm-([a-z-]+):\s*(#[0-9a-f]{6})/gi)].map((m) => [m[1], m[2]]),
  );
}
const light = tokens(':root {');
const night = tokens(":root[data-theme='dark'] {");
const nightBySystem = tokens(":root:not([data-theme='light']) {");
const THEMES = { light, night } as const;

// [foreground, background, what the screens draw with it]
const TEXT: [string, string, string][] = [
  ['ink', 'paper', 'body text on cards'],
  ['ink', 'paper-dim', 'body text on the page'],
  ['ink-soft', 'paper', 'secondary text'],
  ['ink-soft', 'paper-dim', 'secondary text on the page'],
  ['ink-faint', 'paper', 'hints, empty slots'],
  ['ink-faint', 'paper-dim', 'hints on the page'],
  ['brand', 'paper', 'links, secondary buttons'],
  ['brand', 'paper-dim', 'links on the page'],
  ['brand', 'brand-light', 'secondary button hovered'],
  ['on-fill', 'brand', 'primary buttons, header'],
  ['on-fill', 'brand-dark', 'primary button hovered, header link hovered'],
  ['on-fill', 'ink-faint', 'disabled button'],
  ['on-fill', 'ok', 'chosen "good" answer'],
  ['on-fill', 'warn', 'chosen "worn" answer'],
  ['on-fill', 'danger', 'danger button, chosen "damaged" answer'],
  ['ok', 'ok-bg', 'success notes'],
  ['ok', 'paper', 'success text'],
  ['warn', 'warn-bg', 'warning notes'],
  ['warn', 'paper', 'warning text'],
  ['ink', 'warn-bg', 'safety cautions'],
  ['danger', 'danger-bg', 'refusals, out-of-service holds'],
  ['danger', 'paper', 'field errors'],
  ['danger', 'paper-dim', 'field errors on the page'],
  ['hold', 'hold-bg', 'restricted holds'],
  ['hold', 'paper', 'hold text'],
  ['off', 'off-bg', 'reefer-off tag'],
  ['off', 'paper', 'reefer-off text'],
  ['on-fill', 'danger', 'out-of-service tag on the yard map'],
  ['danger', 'danger-bg', 'out-of-service slot'],
];
// shapes that carry meaning: status borders, focus ring, outlined buttons (WCAG 1.4.11)
const NON_TEXT: [string, string, string][] = [
  ['brand', 'paper', 'outlined button border, yard slot border'],
  ['brand', 'paper-dim', 'focus ring'],
  ['ink-soft', 'paper', 'answer button border'],
  ['danger', 'paper', 'out-of-service border'],
  ['danger', 'danger-bg', 'out-of-service slot border on its fill'],
  ['off', 'paper', 'reefer-off border'],
  ['hold', 'paper', 'restricted border'],
  ['warn', 'paper', 'low-fuel border, caution bar'],
  ['ok', 'paper', 'passed border'],
];

describe('theme tokens', () => {
  it('gives the night theme the same values whether chosen on the switch or by the phone', () => {
    expect(Object.keys(night).length).toBeGreaterThanOrEqual(20);
    // written once in the source
    expect(readFileSync(source, 'utf8').match(/--hm-ink: #f1f5f9/g)).toHaveLength(1);
    expect(nightBySystem).toEqual(night);
    expect(Object.keys(night).sort()).toEqual(Object.keys(light).sort());
  });
});

describe('our WCAG formula agrees with a reference library (colorjs.io, WCAG21 contrast)', () => {
  // worked values from the WCAG 2.2 definition: black on white is 21:1, white's luminance is 1
  it('matches the definition at its ends', () => {
    expect(contrastRatio('#000000', '#ffffff')).toBeCloseTo(21, 6);
    expect(relativeLuminance('#ffffff')).toBeCloseTo(1, 9);
    expect(relativeLuminance('#000000')).toBe(0);
  });
  it.each(Object.entries(THEMES))('matches colorjs.io on every %s pair', (_, t) => {
    for (const [fg, bg] of [...TEXT, ...NON_TEXT]) {
      const reference = new Color(t[fg]).contrast(new Color(t[bg]), 'WCAG21');
      // colorjs.io linearises sRGB through its own matrix; the two agree to the second decimal
      expect(contrastRatio(t[fg], t[bg])).toBeCloseTo(reference, 2);
    }
  });
});

describe.each(Object.entries(THEMES))('%s theme meets WCAG 2.2 AA', (name, t) => {
  it.each(TEXT)('text %s on %s (%s) ≥ 4.5:1', (fg, bg) => {
    const ratio = contrastRatio(t[fg], t[bg]);
    expect(ratio, `${name} ${fg} ${t[fg]} on ${bg} ${t[bg]}: ${ratio.toFixed(2)}`).toBeGreaterThanOrEqual(
      AA_TEXT,
    );
  });
  it.each(NON_TEXT)('shape %s against %s (%s) ≥ 3:1', (fg, bg) => {
    const ratio = contrastRatio(t[fg], t[bg]);
    expect(ratio, `${name} ${fg} on ${bg}: ${ratio.toFixed(2)}`).toBeGreaterThanOrEqual(AA_NON_TEXT);
  });
});

describe('status colours keep their meaning at night', () => {
  const hue = (hex: string) => new Color(hex).to('hsl').coords[0] ?? 0;
  const gap = (a: number, b: number) => Math.min(Math.abs(a - b), 360 - Math.abs(a - b));
  it.each(Object.entries(STATUS_TONES))('%s (%s) stays the same hue in both themes', (_, tone) => {
    for (const key of [tone, `${tone}-bg`]) {
      expect(
        gap(hue(light[key]), hue(night[key])),
        `${key}: ${light[key]} / ${night[key]}`,
      ).toBeLessThanOrEqual(15);
    }
  });
  it('tells the five tones apart by hue in each theme (red, orange, amber, green, violet)', () => {
    for (const t of Object.values(THEMES)) {
      const hues = ['danger', 'hold', 'warn', 'ok', 'off'].map((k) => hue(t[k]));
      for (let i = 0; i < hues.length; i++)
        for (let j = i + 1; j < hues.length; j++) expect(gap(hues[i], hues[j])).toBeGreaterThanOrEqual(10);
    }
  });
});
