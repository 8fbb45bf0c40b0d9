// What one page load spends before its Largest Contentful Paint, read in the page after `load`:
// Navigation and Resource Timing (W3C) for the first byte, the end of the streamed HTML, the
// style sheets, fonts and scripts; Paint Timing for the first contentful paint; the LCP entry
// (W3C Largest Contentful Paint draft) with its element; when React had hydrated the document
// (an init script watches for the fiber React attaches to <html>; the App Router sets no mark);
// and, through the Chrome DevTools Protocol's Performance domain, the main thread's busy time.
import type { BrowserContext, Page } from '@playwright/test';

export type Profile = {
  ttfb: number;
  htmlEnd: number;
  cssEnd: number;
  fontEnd: number;
  jsEnd: number;
  domContentLoaded: number;
  hydrated: number;
  fcp: number;
  lcp: number;
  element: string;
  htmlKb: number;
  cssKb: number;
  jsKb: number;
  scriptMs: number;
  taskMs: number;
};

/** Records when React's fiber first appears on <html> (hydrateRoot(document) puts it there). */
export const HYDRATION_PROBE = `(() => {
  const tick = () => {
    const root = document.documentElement;
    if (root && Object.keys(root).some((k) => k.startsWith('__reactFiber$'))) {
      window.__hmHydratedAt = performance.now();
      return;
    }
    requestAnimationFrame(tick);
  };
  requestAnimationFrame(tick);
})();`;

/** Opens the page with the probe and the CDP Performance domain on, then reads its timeline. */
export async function profileLoad(context: BrowserContext, url: string): Promise<Profile> {
  const page = await context.newPage();
  await page.addInitScript(HYDRATION_PROBE);
  const cdp = await context.newCDPSession(page);
  await cdp.send('Performance.enable');
  await page.goto(url, { waitUntil: 'load', timeout: 60_000 });
  const timeline = await readTimeline(page);
  const { metrics } = await cdp.send('Performance.getMetrics');
  const metric = (name: string) => (metrics.find((m) => m.name === name)?.value ?? 0) * 1000;
  await cdp.detach();
  return { ...timeline, scriptMs: metric('ScriptDuration'), taskMs: metric('TaskDuration') };
}

// In-page code as a string: tsx would wrap named inner functions in a helper the page lacks.
const TIMELINE = `new Promise((resolve) => {
  let last;
  new PerformanceObserver((list) => {
    for (const e of list.getEntries()) last = e;
  }).observe({ type: 'largest-contentful-paint', buffered: true });
  setTimeout(() => {
    const nav = performance.getEntriesByType('navigation')[0];
    const res = performance.getEntriesByType('resource');
    const of = (re) => res.filter((r) => re.test(new URL(r.name).pathname));
    const end = (list) => Math.max(0, ...list.map((r) => r.responseEnd));
    const kb = (list) => list.reduce((s, r) => s + r.encodedBodySize, 0) / 1024;
    const css = of(/\\.css$/);
    const js = of(/\\.js$/);
    const el = last && last.element;
    const text = ((el && el.textContent) || '').trim().replace(/\\s+/g, ' ').slice(0, 40);
    const element = el
      ? '<' + el.tagName.toLowerCase() + (el.id ? '#' + el.id : '') + '> ' + (last.url ? last.url : JSON.stringify(text))
      : 'none';
    resolve({
      ttfb: nav.responseStart,
      htmlEnd: nav.responseEnd,
      cssEnd: end(css),
      fontEnd: end(of(/\\.woff2?$/)),
      jsEnd: end(js),
      domContentLoaded: nav.domContentLoadedEventEnd,
      hydrated: window.__hmHydratedAt || 0,
      fcp: (performance.getEntriesByName('first-contentful-paint')[0] || {}).startTime || 0,
      lcp: last ? last.startTime : 0,
      element,
      htmlKb: nav.encodedBodySize / 1024,
      cssKb: kb(css),
      jsKb: kb(js),
    });
  }, 1500);
})`;

function readTimeline(page: Page) {
  return page.evaluate(TIMELINE) as Promise<Omit<Profile, 'scriptMs' | 'taskMs'>>;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const s = (ms: number) => (ms / 1000).toFixed(2);

/** The median of each figure over the runs, as two lines under the page's LCP line. */
export function breakdown(runs: Profile[]): string[] {
  const m = (k: keyof Profile) => median(runs.map((r) => r[k] as number));
  const elements = [...new Set(runs.map((r) => r.element))].join(' | ');
  return [
    `    TTFB ${s(m('ttfb'))} · HTML streamed ${s(m('htmlEnd'))} · CSS ${s(m('cssEnd'))} · fonts ${s(m('fontEnd'))} · ` +
      `scripts ${s(m('jsEnd'))} · DOMContentLoaded ${s(m('domContentLoaded'))} · hydrated ${s(m('hydrated'))} · ` +
      `FCP ${s(m('fcp'))} · LCP ${s(m('lcp'))} s`,
    `    LCP element ${elements} · HTML ${m('htmlKb').toFixed(0)} KB, CSS ${m('cssKb').toFixed(0)} KB, ` +
      `JS ${m('jsKb').toFixed(0)} KB (compressed) · main thread: script ${m('scriptMs').toFixed(0)} ms, tasks ${m('taskMs').toFixed(0)} ms`,
  ];
}
