import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { ButtonLink } from '@/app/_components/button';
import { ReceiptSummary } from '@/app/_components/receipt-summary';
import { getReceipt } from '@/db/queries/handoffs';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { idParamSchema } from '@/lib/validation/handoffs';

export const metadata: Metadata = { title: 'Receipt' };

export default async function ReceiptPage({ params }: PageProps<'/gate/receipts/[id]'>) {
  const user = await requireUser(SECTION_ROLES.gate);
  const id = idParamSchema.safeParse((await params).id);
  if (!id.success) notFound();
  const receipt = await getReceipt(id.data, user);
  if (!receipt) notFound();
  return (
    <div className="mx-auto max-w-xl space-y-4">
      <h1 className="text-gate-xl font-bold">
        Receipt: {receipt.kind} of {receipt.unitNumber}
      </h1>
      <p className="text-gate">
        Recorded. A copy goes by e-mail; anyone holding it can check it on the verify page.
      </p>
      <ReceiptSummary receipt={receipt} showPhotos />
      <a
        href={`/gate/receipts/${receipt.handoffId}/pdf`}
        download
        className="block text-center text-gate font-bold text-brand underline"
      >
        Download the receipt (PDF)
      </a>
      <ButtonLink href="/gate" className="w-full">
        Next trailer
      </ButtonLink>
    </div>
  );
}
