import type { Metadata } from 'next';
import { countTrailersByStatus } from '@/db/queries/trailers';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { GateLookup } from './_components/gate-lookup';

export const metadata: Metadata = { title: 'Gate' };

export default async function GatePage() {
  const user = await requireUser(SECTION_ROLES.gate);
  const counts = await countTrailersByStatus(user.terminalId);
  const inYard = counts.find((c) => c.status === 'in_yard')?.count ?? 0;
  return (
    <div className="mx-auto max-w-lg space-y-4">
      <div>
        <h1 className="text-gate-xl font-bold">Gate</h1>
        <p className="text-gate text-ink-soft">
          {user.terminalName ?? 'No home terminal'}: {inYard} trailers in the yard. Scan the trailer&apos;s
          label to drop or hook it.
        </p>
      </div>
      <GateLookup />
    </div>
  );
}
