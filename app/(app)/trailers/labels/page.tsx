import type { Metadata } from 'next';
import Link from 'next/link';
import { ButtonLink } from '@/app/_components/button';
import { getTranslations } from 'next-intl/server';
import { Caution } from '@/app/_components/caution';
import { EmptyState } from '@/app/_components/empty-state';
import { getRowName, listRowsForLabels } from '@/db/queries/labels';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { refusalSayer } from '@/lib/server/i18n/say';
import { prepareLabelSheet } from '@/lib/server/labels';
import { labelSheetQuerySchema } from '@/lib/validation/labels';
import { LabelSheet } from './_components/label-sheet';
import { PrintButton } from './_components/print-button';
import { RowChooser } from './_components/row-chooser';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Trailers'))('labels.title') };
}

export default async function LabelsPage({ searchParams }: PageProps<'/trailers/labels'>) {
  const user = await requireUser(SECTION_ROLES.trailers);
  const sp = await searchParams;
  const t = await getTranslations('Trailers');
  const c = await getTranslations('Cautions');
  const say = await refusalSayer();
  if (sp.ids === undefined && sp.row === undefined)
    return <RowChooser rows={await listRowsForLabels()} homeTerminalId={user.terminalId} />;

  const parsed = labelSheetQuerySchema.safeParse({ ids: sp.ids, row: sp.row });
  if (!parsed.success) {
    return (
      <EmptyState title={t('labels.nothing')}>
        {say(parsed.error.issues[0]?.message ?? '')}{' '}
        <Link href="/trailers" className="font-bold text-brand underline">
          {t('labels.nothingText')}
        </Link>
      </EmptyState>
    );
  }
  const q = parsed.data;
  const trailers = await prepareLabelSheet(user, q.row ? { rowId: q.row } : { trailerIds: q.ids! });
  const row = q.row ? await getRowName(q.row) : null;
  const title = row
    ? t('labels.forRow', { terminal: row.terminalName, row: row.name })
    : t('labels.forCount', { count: trailers.length });
  const pdfQuery = q.row ? `row=${q.row}` : `ids=${q.ids!.join(',')}`;
  return (
    <div className="space-y-4">
      <div className="no-print space-y-3">
        <h1 className="text-gate-xl font-bold">{title}</h1>
        <p className="text-gate text-ink-soft">{t('labels.how')}</p>
        <Caution title={t('labels.puttingOn')}>
          {c('reefer')} {t('labels.fromGround')}
        </Caution>
        <div className="flex flex-wrap gap-2">
          <PrintButton />
          <ButtonLink variant="secondary" href={`/trailers/labels/pdf?${pdfQuery}`} prefetch={false}>
            {t('labels.pdf')}
          </ButtonLink>
        </div>
      </div>
      {trailers.length === 0 ? (
        <EmptyState title={t('labels.noTrailers')}>
          {row ? t('labels.emptyRow') : t('labels.unknownTrailers')}
        </EmptyState>
      ) : (
        <LabelSheet trailers={trailers} />
      )}
    </div>
  );
}
