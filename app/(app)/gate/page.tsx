import type { Metadata } from 'next';
import { getTranslations } from 'next-intl/server';
import { countTrailersByStatus } from '@/db/queries/trailers';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { GateLookup } from './_components/gate-lookup';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Gate'))('title') };
}

export default async function GatePage() {
  const user = await requireUser(SECTION_ROLES.gate);
  const counts = await countTrailersByStatus(user.terminalId);
  const t = await getTranslations('Gate');
  const tShell = await getTranslations('Shell');
  const inYard = counts.find((c) => c.status === 'in_yard')?.count ?? 0;
  return (
    <div className="mx-auto max-w-lg space-y-4">
      <div>
        <h1 className="text-gate-xl font-bold">{t('title')}</h1>
        <p className="text-gate text-ink-soft">
          {t('summary', {
            terminal: user.terminalName ?? tShell('noTerminal'),
            count: inYard,
          })}
        </p>
      </div>
      <GateLookup />
    </div>
  );
}
