import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import { baseURL } from '../../playwright.config';
import { ACCOUNTS, SignInPage, type AccountName } from './pages/sign-in-page';
import {
  englishDateWords,
  englishFragments,
  expectNoEnglishOn,
  fixedParts,
  leaks,
} from './support/catalogue-leaks';

// Issue 13 item 1: a rendered Spanish page shows no English message. The English catalogue is the
// reference: every fixed part of an English message (a word or a sentence) that Spanish does not
// share must be absent from the visible text and the accessible names of each main page.
const NAMESPACES = [
  'Shell',
  'Yard',
  'Walk',
  'Cautions',
  'Desk',
  'Case',
  'Trailers',
  'Admin',
  'Verify',
  'Errors',
  'Common',
  'Refusals',
] as const;
const FRAGMENTS = englishFragments(NAMESPACES);
// a date written by the one clock in English ("Dec 2, 2026, 15:04 CST") leaks its month name
const DATE_WORDS = englishDateWords();

async function inSpanish(context: BrowserContext) {
  await context.addCookies([{ name: 'hm-locale', value: 'es', url: baseURL }]);
}

async function expectNoEnglish(page: Page, path: string) {
  await page.goto(path);
  await expect(page.locator('main')).toBeVisible();
  await expectNoEnglishOn(page, [...FRAGMENTS, ...DATE_WORDS], path);
}

test('the check itself: it knows the English words, skips what Spanish shares, and finds a leak', () => {
  expect(fixedParts('{count, plural, one {# trailer} other {# trailers}} · free time {hours} h')).toEqual([
    'free time',
  ]);
  expect(FRAGMENTS).toContain('Yard board');
  expect(FRAGMENTS).toContain('Fuel the reefer');
  // shared by both languages, so a Spanish page may show them
  expect(FRAGMENTS).not.toContain('VIN');
  expect(FRAGMENTS).not.toContain('Hitchmark');
  expect(FRAGMENTS.length).toBeGreaterThan(300);
  expect(leaks('Tablero del patio · Yard board', FRAGMENTS)).toContain('Yard board');
  // whole words only: "Mapa" is not the English "Map"
  expect(leaks('Mapa', ['Map'])).toEqual([]);
});

test('the check itself: an English month or weekday fails a Spanish page, the Spanish date passes', () => {
  // Unicode CLDR month and day names (en and es), as Intl writes them
  expect(DATE_WORDS).toEqual(expect.arrayContaining(['December', 'Dec', 'Wednesday', 'Wed', 'Sep']));
  expect(leaks('Abierto Dec 2, 2026, 15:04 CST', DATE_WORDS)).toEqual(['Dec']);
  expect(leaks('Abierto 2 dic 2026, 15:04 GMT-6 · miércoles', DATE_WORDS)).toEqual([]);
});

const JOURNEYS: { who: AccountName; pages: (page: Page) => Promise<string[]> }[] = [
  {
    who: 'jockey',
    pages: async () => ['/yard', '/yard/moves', '/yard/walks', '/yard/tasks'],
  },
  {
    who: 'clerk',
    pages: async (page) => {
      await page.goto('/desk');
      const firstCase = await page
        .getByRole('list', { name: 'Casos' })
        .getByRole('link')
        .first()
        .getAttribute('href');
      await page.goto('/trailers');
      const firstTrailer = await page.locator('tbody a[href^="/trailers/"]').first().getAttribute('href');
      return ['/desk', firstCase!, '/desk/reports', '/trailers', firstTrailer!, '/trailers/labels'];
    },
  },
  {
    who: 'admin',
    pages: async () => ['/admin', '/admin/yard', '/admin/rates', '/admin/anchors'],
  },
];

for (const { who, pages } of JOURNEYS) {
  test(`${who}: every main page in Spanish shows no English message`, async ({ page, context }) => {
    // several pages, each fully rendered and read, on a shared 2-core machine
    test.setTimeout(300_000);
    await new SignInPage(page).signIn(who);
    await expect(page).toHaveURL(new RegExp(`${ACCOUNTS[who].home}$`));
    await inSpanish(context);
    for (const path of await pages(page)) await expectNoEnglish(page, path);
  });
}

test('the public verify page in Spanish, with a code that is not on any receipt', async ({
  page,
  context,
}) => {
  await inSpanish(context);
  await page.goto('/verify?code=ZZZZ-ZZZZ');
  await expect(page.getByText('Ningún comprobante tiene este código.', { exact: false })).toBeVisible();
  await expectNoEnglish(page, '/verify?code=ZZZZ-ZZZZ');
});
