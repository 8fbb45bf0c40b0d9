import type { Metadata } from 'next';
import Link from 'next/link';
import { ButtonLink } from '@/app/_components/button';
import { Caution, CAUTIONS } from '@/app/_components/caution';
import { EmptyState } from '@/app/_components/empty-state';
import { getRowName, listRowsForLabels } from '@/db/queries/labels';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { prepareLabelSheet } from '@/lib/server/labels';
import { labelSheetQuerySchema } from '@/lib/validation/labels';
import { LabelSheet } from './_components/label-sheet';
import { PrintButton } from './_components/print-button';
import { RowChooser } from './_components/row-chooser';

export const metadata: Metadata = { title: 'Trailer labels' };

export default async function LabelsPage({ searchParams }: PageProps<'/trailers/labels'>) {
  const user = await requireUser(SECTION_ROLES.trailers);
  const sp = await searchParams;
  if (sp.ids === undefined && sp.row === undefined)
    return <RowChooser rows={await listRowsForLabels()} homeTerminalId={user.terminalId} />;

  const parsed = labelSheetQuerySchema.safeParse({ ids: sp.ids, row: sp.row });
  if (!parsed.success) {
    return (
      <EmptyState title="Nothing to print">
        {parsed.error.issues[0]?.message} Choose trailers on the{' '}
        <Link href="/trailers" className="font-bold text-brand underline">
          Trailers
        </Link>{' '}
        page, or{' '}
        <Link href="/trailers/labels" className="font-bold text-brand underline">
          a row
        </Link>
        .
      </EmptyState>
    );
  }
  const q = parsed.data;
  const trailers = await prepareLabelSheet(user, q.row ? { rowId: q.row } : { trailerIds: q.ids! });
  const row = q.row ? await getRowName(q.row) : null;
  const title = row
    ? `Labels for ${row.terminalName}, ${row.name}`
    : `Labels for ${trailers.length} trailer${trailers.length === 1 ? '' : 's'}`;
  const pdfQuery = q.row ? `row=${q.row}` : `ids=${q.ids!.join(',')}`;
  return (
    <div className="space-y-4">
      <div className="no-print space-y-3">
        <h1 className="text-gate-xl font-bold">{title}</h1>
        <p className="text-gate text-ink-soft">
          Print on plain paper or label stock, four to a Letter page. Stick the label where a driver can reach
          it from the ground, away from the reefer unit.
        </p>
        <Caution title="Putting labels on">
          {CAUTIONS.reefer} Stick labels on from the ground; do not climb the trailer or go under it to do so.
        </Caution>
        <div className="flex flex-wrap gap-2">
          <PrintButton />
          <ButtonLink variant="secondary" href={`/trailers/labels/pdf?${pdfQuery}`} prefetch={false}>
            Download PDF
          </ButtonLink>
        </div>
      </div>
      {trailers.length === 0 ? (
        <EmptyState title="No trailers here">
          {row ? 'No trailer stands in this row now.' : 'None of the chosen trailers is known to Hitchmark.'}
        </EmptyState>
      ) : (
        <LabelSheet trailers={trailers} />
      )}
    </div>
  );
}
