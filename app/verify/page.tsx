import type { Metadata } from 'next';
import { getTranslations } from 'next-intl/server';
import { Button } from '@/app/_components/button';
import { ReceiptSummary } from '@/app/_components/receipt-summary';
import { checkReceipt } from '@/lib/server/handoffs/verify';
import { refusalSayer } from '@/lib/server/i18n/say';
import { verificationCodeSchema } from '@/lib/validation/handoffs';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Verify'))('title') };
}

// Public, no sign-in: shows what the receipt itself shows, nothing more (no photos, no history),
// and only when the stored record still matches what was receipted.
export default async function VerifyPage({ searchParams }: PageProps<'/verify'>) {
  const t = await getTranslations('Verify');
  const say = await refusalSayer();
  const raw = (await searchParams).code;
  const typed = typeof raw === 'string' ? raw : '';
  const parsed = typed ? verificationCodeSchema.safeParse(typed) : null;
  const checked = parsed?.success ? await checkReceipt(parsed.data) : null;
  const error =
    parsed && !parsed.success
      ? say(parsed.error.issues[0].message)
      : parsed?.success && !checked
        ? t('noReceipt')
        : null;
  return (
    <main className="mx-auto max-w-xl space-y-4 p-3">
      <h1 className="text-gate-xl font-bold">{t('heading')}</h1>
      <form method="get" className="space-y-2">
        <label htmlFor="code" className="block text-gate font-bold">
          {t('code')}
        </label>
        <input
          id="code"
          name="code"
          defaultValue={typed}
          autoCapitalize="characters"
          autoComplete="off"
          aria-describedby="code-error"
          className="block min-h-tap w-full rounded-lg border-2 border-paper-line px-3 font-mono text-gate-lg uppercase"
        />
        <p id="code-error" aria-live="polite" className="min-h-6 text-gate-sm font-bold text-danger">
          {error ?? ''}
        </p>
        <Button type="submit" className="w-full">
          {t('check')}
        </Button>
      </form>
      {checked?.status === 'genuine' ? (
        <>
          <p role="status" className="rounded-lg bg-ok-bg p-3 text-gate font-bold text-ok">
            {t('genuine')}
          </p>
          <ReceiptSummary receipt={checked.receipt} showPhotos={false} />
        </>
      ) : checked ? (
        <p
          role="alert"
          className="rounded-lg border-l-8 border-danger bg-danger-bg p-3 text-gate font-bold text-danger"
        >
          {t(`why.${checked.status}`)}
        </p>
      ) : null}
    </main>
  );
}
