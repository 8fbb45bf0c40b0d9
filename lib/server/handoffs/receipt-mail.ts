// The receipt e-mail, queued in the handoff's own transaction (delivered after commit).
import 'server-only';
import type { Tx } from '@/db';
import { enqueueEmail } from '@/db/queries/outbox';
import { receiptSubject, receiptText, type ReceiptView } from '@/lib/handoffs/receipt';
import { appUrl } from '../env';

export async function enqueueReceiptEmail(tx: Tx, to: { to: string; cc: string | null }, view: ReceiptView) {
  await enqueueEmail(
    {
      ...to,
      subject: receiptSubject(view),
      text: receiptText(view, `${appUrl()}/verify`),
      relatedType: 'handoff',
      relatedId: view.handoffId,
    },
    tx,
  );
}
