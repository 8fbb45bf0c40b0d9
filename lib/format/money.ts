// Money is stored in whole cents; this is the one place it becomes text.

const formatters = new Map<string, Intl.NumberFormat>();

function formatter(locale: string): Intl.NumberFormat {
  let f = formatters.get(locale);
  if (!f) {
    f = new Intl.NumberFormat(locale, { style: 'currency', currency: 'USD' });
    formatters.set(locale, f);
  }
  return f;
}

/** `12345` → `$123.45`; `-50` → `-$0.50`. */
export function formatMoney(cents: number, locale = 'en-US'): string {
  return formatter(locale).format(cents / 100);
}

/** Cents as a plain dollars figure for a form input: `12345` → `123.45`. */
export function centsToDollarsInput(cents: number): string {
  const sign = cents < 0 ? '-' : '';
  const abs = Math.abs(cents);
  return `${sign}${Math.trunc(abs / 100)}.${String(abs % 100).padStart(2, '0')}`;
}
