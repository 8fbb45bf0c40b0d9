import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { getLocale, getTranslations } from 'next-intl/server';
import { ButtonLink } from '@/app/_components/button';
import { formatTime } from '@/lib/format/time';
import { canOpen } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { resolveLabelToken } from '@/lib/server/labels';
import { labelTokenSchema } from '@/lib/validation/labels';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Label'))('title') };
}

// Where a label's QR code points. A good label opens the handoff start page (jockeys, who do not
// use the gate, get the trailer file); a forged, damaged or replaced one is refused in words.
export default async function ScanLinkPage({ params }: PageProps<'/l/[token]'>) {
  const user = await requireUser();
  const parsed = labelTokenSchema.safeParse((await params).token);
  const label = parsed.success
    ? await resolveLabelToken(parsed.data)
    : ({ ok: false, error: 'not_ours' } as const);
  if (label.ok)
    redirect(
      canOpen(user.role, 'gate') ? `/gate/trailers/${label.trailerId}` : `/trailers/${label.trailerId}`,
    );

  const isReplaced = label.error === 'revoked';
  const next = canOpen(user.role, 'gate') ? '/gate' : '/yard';
  const t = await getTranslations('Label');
  const locale = await getLocale();
  const replacedAt = isReplaced ? label.replacedAt : null;
  return (
    <section
      className="mx-auto max-w-lg space-y-4 rounded-xl border-l-8 border-danger bg-paper p-5"
      aria-labelledby="label-refused"
    >
      <h1 id="label-refused" className="text-gate-xl font-bold">
        {isReplaced ? t('old') : t('refused')}
      </h1>
      <p className="text-gate-lg">
        {!isReplaced
          ? t('notOurs')
          : replacedAt
            ? t('replacedOn', {
                date: formatTime(replacedAt, user.terminalTimeZone ?? 'UTC', 'date', locale),
              })
            : t('replaced')}
      </p>
      <p className="text-gate text-ink-soft">{isReplaced ? t('oldHelp') : t('refusedHelp')}</p>
      <ButtonLink href={next}>{t('type')}</ButtonLink>
    </section>
  );
}
