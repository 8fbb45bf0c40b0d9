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

export const metadata: Metadata = { title: 'Admin' };

export default async function AdminPage() {
  const admin = await requireUser(SECTION_ROLES.admin);
  const [people, carrierRows] = await Promise.all([listUsers(), listCarriers()]);
  const t = await getTranslations('Account');
  return (
    <div className="space-y-6">
      <h1 className="text-gate-xl font-bold">Admin</h1>
      <nav aria-label="Admin areas" className="flex flex-wrap gap-2">
        <Link
          href="/admin/yard"
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
        >
          Yard layout: rows, slots and dock doors
        </Link>
        <Link
          href="/admin/rates"
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
        >
          Repair rate card
        </Link>
        <Link
          href="/admin/anchors"
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
        >
          Record anchors
        </Link>
      </nav>
      <section aria-labelledby="people">
        <h2 id="people" className="text-gate-lg font-bold">
          {t('people')}
        </h2>
        <p className="text-gate-sm text-ink-soft">{t('accessNote')}</p>
        <ul className="mt-2 divide-y divide-paper-line rounded-xl bg-paper">
          {people.map((u) => (
            <li key={u.id} className="space-y-2 p-3 text-gate-sm">
              <div className="flex flex-wrap justify-between gap-2">
                <span className="font-bold">
                  {u.name}
                  {u.id === admin.id ? ` (${t('you')})` : ''}
                </span>
                <span>
                  {t(`roles.${u.role}`)} · {u.email ?? u.driverNumber}{' '}
                  {u.carrierScac ? `· ${u.carrierScac}` : ''}
                  {u.isActive ? '' : ` · ${t('off')}`}
                </span>
              </div>
              {u.id === admin.id ? null : (
                <ActionForm
                  action={changeUserAccessAction}
                  ariaLabel={`${t('role')}: ${u.name}`}
                  hidden={{ userId: u.id }}
                  submitLabel={t('saveAccess')}
                  pendingLabel={t('saving')}
                  variant="secondary"
                  className="flex flex-wrap items-end gap-3"
                >
                  <Select label={t('role')} name="role" id={`role-${u.id}`} defaultValue={u.role}>
                    {(u.role === 'driver' ? (['driver'] as const) : STAFF_ROLES).map((r) => (
                      <option key={r} value={r}>
                        {t(`roles.${r}`)}
                      </option>
                    ))}
                  </Select>
                  <label className="flex min-h-tap items-center gap-2 text-gate">
                    <input type="checkbox" name="isActive" defaultChecked={u.isActive} className="h-6 w-6" />
                    {t('active')}
                  </label>
                </ActionForm>
              )}
            </li>
          ))}
        </ul>
      </section>
      <section aria-labelledby="carriers">
        <h2 id="carriers" className="text-gate-lg font-bold">
          Carriers
        </h2>
        <ul className="mt-2 divide-y divide-paper-line rounded-xl bg-paper">
          {carrierRows.map((c) => (
            <li key={c.id} className="flex flex-wrap justify-between gap-2 p-3 text-gate-sm">
              <span className="font-bold">
                {c.scac} — {c.name}
              </span>
              <span>{c.contactEmail}</span>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
