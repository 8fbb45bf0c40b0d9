import { prepareLabelSheet } from '@/db/queries/labels';
import { buildLabelPdf } from '@/lib/labels/label-pdf';
import { SECTION_ROLES } from '@/lib/roles';
import { apiError, invalid } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { labelLink } from '@/lib/server/labels';
import { labelSheetQuerySchema } from '@/lib/validation/labels';

/** GET /trailers/labels/pdf?ids=…|row=… — the same labels as the printable sheet, as a PDF. */
export async function GET(request: Request) {
  const user = await apiUser(SECTION_ROLES.trailers);
  if (user instanceof Response) return user;
  const sp = new URL(request.url).searchParams;
  const parsed = labelSheetQuerySchema.safeParse({
    ids: sp.has('ids') ? sp.getAll('ids') : undefined,
    row: sp.get('row') ?? undefined,
  });
  if (!parsed.success) return invalid(parsed.error, 'Choose trailers or one row to print.');
  const q = parsed.data;
  const trailers = await prepareLabelSheet(q.row ? { rowId: q.row } : { trailerIds: q.ids! }, user.id);
  if (trailers.length === 0)
    return apiError('not_found', 'None of those trailers are known, or the row is empty.');
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
}
