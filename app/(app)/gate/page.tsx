import type { Metadata } from 'next';
import { countTrailersByStatus } from '@/db/queries/trailers';
import { SECTION_ROLES } from '@/lib/roles';
import { requireUser } from '@/lib/server/auth';

export const metadata: Metadata = { title: 'Gate' };

export default async function GatePage() {
  const user = await requireUser(SECTION_ROLES.gate);
  const counts = await countTrailersByStatus(user.terminalId);
  const inYard = counts.find((c) => c.status === 'in_yard')?.count ?? 0;
  return (
    <div className="space-y-3">
      <h1 className="text-gate-xl font-bold">Gate</h1>
      <p className="text-gate">
        {user.terminalName ?? 'No home terminal'}: {inYard} trailers in the yard.
      </p>
    </div>
  );
}
