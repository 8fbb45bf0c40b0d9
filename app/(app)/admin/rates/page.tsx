import type { Metadata } from 'next';
import { getTranslations } from 'next-intl/server';
import { listRates } from '@/db/queries/rates';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { centsToDollarsInput } from '@/lib/format/money';
import { requireUser } from '@/lib/server/auth';
import { AddRateForm, ChangeRateForm } from './_components/rate-forms';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Admin'))('rates.title') };
}

export default async function RatesPage() {
  await requireUser(SECTION_ROLES.admin);
  const rates = await listRates();
  const t = await getTranslations('Admin');
  return (
    <div className="space-y-4">
      <h1 className="text-gate-xl font-bold">{t('rates.title')}</h1>
      <p className="text-gate">{t('rates.intro')}</p>
      <AddRateForm />
      <ul className="divide-y divide-paper-line rounded-xl bg-paper" aria-label={t('rates.list')}>
        {rates.map((r) => (
          <li key={r.id} className="flex flex-wrap items-center justify-between gap-2 p-3">
            <span className="text-gate">
              <code className="font-bold">{r.itemPattern}</code> ·{' '}
              <span data-stored-text="">{r.condition}</span>
            </span>
            <ChangeRateForm
              id={r.id}
              label={`${r.itemPattern} ${r.condition}`}
              amount={centsToDollarsInput(r.amountCents)}
            />
          </li>
        ))}
      </ul>
    </div>
  );
}
