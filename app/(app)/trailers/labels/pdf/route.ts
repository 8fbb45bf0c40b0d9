import { SECTION_ROLES } from '@/lib/auth/roles';
import { buildLabelPdf } from '@/lib/labels/label-pdf';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { labelLink, prepareLabelSheet } from '@/lib/server/labels';
import { labelSheetQuerySchema } from '@/lib/validation/labels';

/** GET /trailers/labels/pdf?ids=…|row=… — the same labels as the printable sheet, as a PDF. */
export const GET = route(
  {
    access: SECTION_ROLES.trailers,
    query: labelSheetQuerySchema,
    invalidMessage: 'Choose trailers or one row to print.',
  },
  async ({ user, query: q }) => {
    const trailers = await prepareLabelSheet(user, q.row ? { rowId: q.row } : { trailerIds: q.ids! });
    if (trailers.length === 0)
      return refuse('not_found', 'None of those trailers are known, or the row is empty.');
    const pdf = await buildLabelPdf(
      trailers.map((t) => ({ ...t, link: labelLink({ id: t.labelId, trailerId: t.id }) })),
    );
    const name =
      trailers.length === 1 ? `label-${trailers[0].unitNumber}.pdf` : `labels-${trailers.length}.pdf`;
    return new Response(Buffer.from(pdf), {
      headers: {
        'content-type': 'application/pdf',
        'content-disposition': `inline; filename="${name}"`,
        'cache-control': 'private, no-store',
      },
    });
  },
);
