import type { Metadata } from 'next';
import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { listCarriers, listUsers } from '@/db/queries/admin';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Admin'))('title') };
}

export default async function AdminPage() {
  await requireUser(SECTION_ROLES.admin);
  const [people, carrierRows] = await Promise.all([listUsers(), listCarriers()]);
  const t = await getTranslations('Admin');
  return (
    <div className="space-y-6">
      <h1 className="text-gate-xl font-bold">{t('title')}</h1>
      <nav aria-label={t('areas')} className="flex flex-wrap gap-2">
        <Link
          href="/admin/yard"
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
        >
          {t('yardLink')}
        </Link>
        <Link
          href="/admin/rates"
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
        >
          {t('ratesLink')}
        </Link>
        <Link
          href="/admin/anchors"
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
        >
          {t('anchorsLink')}
        </Link>
      </nav>
      <section aria-labelledby="people">
        <h2 id="people" className="text-gate-lg font-bold">
          {t('people')}
        </h2>
        <ul className="mt-2 divide-y divide-paper-line rounded-xl bg-paper">
          {people.map((u) => (
            <li key={u.id} className="flex flex-wrap justify-between gap-2 p-3 text-gate-sm">
              <span className="font-bold">{u.name}</span>
              <span>
                {t(`role.${u.role}`)} · <span data-stored-text="">{u.email ?? u.driverNumber}</span>{' '}
                {u.carrierScac ? `· ${u.carrierScac}` : ''}
              </span>
            </li>
          ))}
        </ul>
      </section>
      <section aria-labelledby="carriers">
        <h2 id="carriers" className="text-gate-lg font-bold">
          {t('carriers')}
        </h2>
        <ul className="mt-2 divide-y divide-paper-line rounded-xl bg-paper">
          {carrierRows.map((c) => (
            <li key={c.id} className="flex flex-wrap justify-between gap-2 p-3 text-gate-sm">
              <span className="font-bold" data-stored-text="">
                {c.scac} — {c.name}
              </span>
              <span data-stored-text="">{c.contactEmail}</span>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
