// The receipt e-mail, queued in the handoff's own transaction (delivered after commit).
// No `server-only` marker: the seed runs the submit service under plain Node.
import type { Tx } from '@/db';
import { enqueueEmail } from '@/db/queries/outbox';
import { appUrl as appUrlFromEnv } from './env';
import { receiptSubject, receiptText, type ReceiptView } from '@/lib/handoffs/receipt';

export async function enqueueReceiptEmail(tx: Tx, to: string, view: ReceiptView, appUrl?: string) {
  const base = appUrl ?? appUrlFromEnv();
  await enqueueEmail(
    {
      to,
      subject: receiptSubject(view),
      text: receiptText(view, `${base}/verify`),
      relatedType: 'handoff',
      relatedId: view.handoffId,
    },
    tx,
  );
}
