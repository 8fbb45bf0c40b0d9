import { z } from 'zod';
import { getReceipt } from '@/db/queries/handoffs';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { buildReceiptPdf } from '@/lib/handoffs/receipt-pdf';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { appUrl } from '@/lib/server/env';
import { requestLocale } from '@/lib/server/i18n/request';
import { idParamSchema } from '@/lib/validation/handoffs';

/** GET /gate/receipts/[id]/pdf — the receipt as a PDF in the reader's language, for whoever may read the receipt itself. */
export const GET = route(
  { access: SECTION_ROLES.gate, params: z.object({ id: idParamSchema }), notFound: 'No such receipt.' },
  async ({ user, params }) => {
    const receipt = await getReceipt(params.id, user);
    if (!receipt) return refuse('not_found', 'No such receipt.');
    // in the reader's language: the one their screens are in
    const pdf = await buildReceiptPdf(receipt, `${appUrl()}/verify`, await requestLocale());
    return new Response(Buffer.from(pdf), {
      headers: {
        'content-type': 'application/pdf',
        'content-disposition': `attachment; filename="receipt-${receipt.unitNumber}-${receipt.verificationCode}.pdf"`,
        'cache-control': 'private, no-store',
      },
    });
  },
);
