import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { getLocale, getTranslations } from 'next-intl/server';
import { ButtonLink } from '@/app/_components/button';
import { ReceiptSummary } from '@/app/_components/receipt-summary';
import { getReceipt } from '@/db/queries/handoffs';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { readable } from '@/lib/i18n/reasons';
import { requireUser } from '@/lib/server/auth';
import { idParamSchema } from '@/lib/validation/handoffs';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Common'))('receipt.metaTitle') };
}

export default async function ReceiptPage({ params }: PageProps<'/gate/receipts/[id]'>) {
  const user = await requireUser(SECTION_ROLES.gate);
  const id = idParamSchema.safeParse((await params).id);
  if (!id.success) notFound();
  const stored = await getReceipt(id.data, user);
  if (!stored) notFound();
  // findings and holds in the reader's language (lib/i18n/reasons.ts); the e-mail in each recipient's
  const locale = await getLocale();
  const t = await getTranslations('Common');
  const receipt = {
    ...stored,
    findings: readable(stored.findings, locale, stored.timeZone),
    holds: readable(stored.holds, locale, stored.timeZone),
  };
  return (
    <div className="mx-auto max-w-xl space-y-4">
      <h1 className="text-gate-xl font-bold">
        {t('receipt.pageTitle', { kind: receipt.kind, unit: receipt.unitNumber })}
      </h1>
      <p className="text-gate">{t('receipt.recorded')}</p>
      <ReceiptSummary receipt={receipt} showPhotos />
      <a
        href={`/gate/receipts/${receipt.handoffId}/pdf`}
        download
        className="flex min-h-tap items-center justify-center rounded-lg border-2 border-brand text-gate font-bold text-brand underline"
      >
        {t('receipt.pdf')}
      </a>
      <ButtonLink href="/gate" className="w-full">
        {t('receipt.nextTrailer')}
      </ButtonLink>
    </div>
  );
}
