import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { getTranslations } from 'next-intl/server';
import { z } from 'zod';
import { ButtonLink } from '@/app/_components/button';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { prepareLabelSheet } from '@/lib/server/labels';
import { LabelSheet } from '../../labels/_components/label-sheet';
import { PrintButton } from '../../labels/_components/print-button';
import { ReissueForm } from '../../labels/_components/reissue-form';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Trailers'))('labels.title') };
}

export default async function TrailerLabelPage({ params, searchParams }: PageProps<'/trailers/[id]/label'>) {
  const user = await requireUser(SECTION_ROLES.trailers);
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const [trailer] = await prepareLabelSheet(user, { trailerIds: [id.data] });
  if (!trailer) notFound();
  const wasReissued = (await searchParams).reissued === '1';
  const t = await getTranslations('Trailers');
  return (
    <div className="space-y-4">
      <div className="no-print space-y-3">
        <h1 className="text-gate-xl font-bold">{t('labels.labelFor', { unit: trailer.unitNumber })}</h1>
        {wasReissued ? (
          <p role="status" className="rounded-lg border-2 border-ok bg-ok-bg p-3 text-gate font-bold text-ok">
            {t('labels.reissued')}
          </p>
        ) : null}
        <div className="flex flex-wrap gap-2">
          <PrintButton label={t('labels.printOne')} />
          <ButtonLink variant="secondary" href={`/trailers/labels/pdf?ids=${trailer.id}`} prefetch={false}>
            {t('labels.pdf')}
          </ButtonLink>
        </div>
      </div>
      <div className="max-w-md print:max-w-none">
        <LabelSheet trailers={[trailer]} />
      </div>
      {user.role === 'clerk' || user.role === 'admin' ? (
        <div className="no-print max-w-md">
          <ReissueForm trailerId={trailer.id} unitNumber={trailer.unitNumber} />
        </div>
      ) : null}
    </div>
  );
}
