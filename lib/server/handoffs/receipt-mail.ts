// The receipt e-mail, queued in the handoff's own transaction (delivered after commit): one letter
// per language its readers speak (lib/handoffs/receipt.ts, receiptLetters).
import 'server-only';
import type { Tx } from '@/db';
import { enqueueEmail } from '@/db/queries/outbox';
import { receiptSubject, receiptText, type ReceiptLetter, type ReceiptView } from '@/lib/handoffs/receipt';
import { appUrl } from '../env';

export async function enqueueReceiptEmails(tx: Tx, letters: ReceiptLetter[], view: ReceiptView) {
  for (const letter of letters) {
    await enqueueEmail(
      {
        to: letter.to,
        cc: letter.cc,
        subject: receiptSubject(view, letter.locale),
        text: receiptText(view, `${appUrl()}/verify`, letter.locale),
        relatedType: 'handoff',
        relatedId: view.handoffId,
      },
      tx,
    );
  }
}
