import type { Metadata } from 'next';
import Link from 'next/link';
import { listCarriers, listUsers } from '@/db/queries/admin';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';

export const metadata: Metadata = { title: 'Admin' };

export default async function AdminPage() {
  await requireUser(SECTION_ROLES.admin);
  const [people, carrierRows] = await Promise.all([listUsers(), listCarriers()]);
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
          People and roles
        </h2>
        <ul className="mt-2 divide-y divide-paper-line rounded-xl bg-paper">
          {people.map((u) => (
            <li key={u.id} className="flex flex-wrap justify-between gap-2 p-3 text-gate-sm">
              <span className="font-bold">{u.name}</span>
              <span>
                {u.role} · {u.email ?? u.driverNumber} {u.carrierScac ? `· ${u.carrierScac}` : ''}
              </span>
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
