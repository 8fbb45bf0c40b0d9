import type { Metadata } from 'next';
import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { ActionForm } from '@/app/_components/action-form';
import { Select } from '@/app/_components/field';
import { listCarriers, listUsers } from '@/db/queries/admin';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { STAFF_ROLES } from '@/lib/validation/account';
import { changeUserAccessAction } from './actions';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Admin'))('title') };
}

export default async function AdminPage() {
  const admin = await requireUser(SECTION_ROLES.admin);
  const [people, carrierRows] = await Promise.all([listUsers(), listCarriers()]);
  const a = await getTranslations('Account');
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
          {a('people')}
        </h2>
        <p className="text-gate-sm text-ink-soft">{a('accessNote')}</p>
        <ul className="mt-2 divide-y divide-paper-line rounded-xl bg-paper">
          {people.map((u) => (
            <li key={u.id} className="space-y-2 p-3 text-gate-sm">
              <div className="flex flex-wrap justify-between gap-2">
                <span className="font-bold">
                  {u.name}
                  {u.id === admin.id ? ` (${a('you')})` : ''}
                </span>
                <span>
                  {a(`roles.${u.role}`)} · <span data-stored-text="">{u.email ?? u.driverNumber}</span>{' '}
                  {u.carrierScac ? `· ${u.carrierScac}` : ''}
                  {u.isActive ? '' : ` · ${a('off')}`}
                </span>
              </div>
              {u.id === admin.id ? null : (
                <ActionForm
                  action={changeUserAccessAction}
                  ariaLabel={`${a('role')}: ${u.name}`}
                  hidden={{ userId: u.id }}
                  submitLabel={a('saveAccess')}
                  pendingLabel={a('saving')}
                  variant="secondary"
                  className="flex flex-wrap items-end gap-3"
                >
                  <Select label={a('role')} name="role" id={`role-${u.id}`} defaultValue={u.role}>
                    {(u.role === 'driver' ? (['driver'] as const) : STAFF_ROLES).map((r) => (
                      <option key={r} value={r}>
                        {a(`roles.${r}`)}
                      </option>
                    ))}
                  </Select>
                  <label className="flex min-h-tap items-center gap-2 text-gate">
                    <input type="checkbox" name="isActive" defaultChecked={u.isActive} className="h-6 w-6" />
                    {a('active')}
                  </label>
                </ActionForm>
              )}
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
