import type { Metadata } from 'next';
import { listRates } from '@/db/queries/rates';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { centsToDollarsInput } from '@/lib/format/money';
import { requireUser } from '@/lib/server/auth';
import { AddRateForm, ChangeRateForm } from './_components/rate-forms';

export const metadata: Metadata = { title: 'Repair rate card' };

export default async function RatesPage() {
  await requireUser(SECTION_ROLES.admin);
  const rates = await listRates();
  return (
    <div className="space-y-4">
      <h1 className="text-gate-xl font-bold">Repair rate card</h1>
      <p className="text-gate">
        A rate applies to a damaged item when its key is the item key or a prefix of it at a dot (
        <code>rear</code> prices every rear item, <code>rear.door_left</code> only the left door); the longest
        matching key wins. Type amounts in dollars and cents, like 425.00.
      </p>
      <AddRateForm />
      <ul className="divide-y divide-paper-line rounded-xl bg-paper" aria-label="Rates">
        {rates.map((r) => (
          <li key={r.id} className="flex flex-wrap items-center justify-between gap-2 p-3">
            <span className="text-gate">
              <code className="font-bold">{r.itemPattern}</code> · {r.condition}
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
