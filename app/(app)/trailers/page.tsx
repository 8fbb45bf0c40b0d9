import type { Metadata } from 'next';
import Link from 'next/link';
import { z } from 'zod';
import { EmptyState } from '@/app/_components/empty-state';
import { listTrailers } from '@/db/queries/trailers';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { plainText } from '@/lib/validation/text';

export const metadata: Metadata = { title: 'Trailers' };

const searchSchema = z.object({ q: plainText(40).optional().catch(undefined) });

export default async function TrailersPage({ searchParams }: PageProps<'/trailers'>) {
  await requireUser(SECTION_ROLES.trailers);
  const { q } = searchSchema.parse(await searchParams);
  const rows = await listTrailers({ q });
  return (
    <div className="space-y-4">
      <h1 className="text-gate-xl font-bold">Trailers</h1>
      <form role="search" className="flex gap-2">
        <label htmlFor="q" className="sr-only">
          Unit number, VIN or plate
        </label>
        <input
          id="q"
          name="q"
          defaultValue={q}
          placeholder="Unit number, VIN or plate"
          className="min-h-tap flex-1 rounded-lg border-2 border-paper-line px-3 text-gate"
        />
        <button type="submit" className="min-h-tap rounded-lg bg-brand px-5 text-gate font-bold text-white">
          Find
        </button>
      </form>
      {rows.length === 0 ? (
        <EmptyState title="No trailer matches">
          Check the unit number, or search by the last digits of the VIN.
        </EmptyState>
      ) : (
        <form action="/trailers/labels" className="space-y-2">
          <div className="flex flex-wrap gap-2">
            <button
              type="submit"
              className="min-h-tap rounded-lg bg-brand px-5 text-gate font-bold text-white"
            >
              Print labels for ticked trailers
            </button>
            <Link
              href="/trailers/labels"
              className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-5 text-gate font-bold text-brand"
            >
              Print a whole row
            </Link>
          </div>
          <div className="overflow-x-auto rounded-xl bg-paper">
            <table className="w-full text-left text-gate-sm">
              <thead className="bg-paper-dim">
                <tr>
                  <th className="p-2">
                    <span className="sr-only">Print label</span>
                  </th>
                  <th className="p-2">Unit</th>
                  <th className="p-2">Kind</th>
                  <th className="p-2">Owner</th>
                  <th className="p-2">Where</th>
                  <th className="p-2">VIN</th>
                </tr>
              </thead>
              <tbody>
                {rows.map((t) => (
                  <tr key={t.id} className="border-t border-paper-line">
                    <td className="p-2">
                      <input
                        type="checkbox"
                        name="ids"
                        value={t.id}
                        aria-label={`Print label for ${t.unitNumber}`}
                        className="size-6"
                      />
                    </td>
                    <td className="p-2 font-bold">
                      <Link className="text-brand underline" href={`/trailers/${t.id}`}>
                        {t.unitNumber}
                      </Link>{' '}
                      <Link
                        className="text-gate-sm font-normal text-brand underline"
                        href={`/trailers/${t.id}/label`}
                        aria-label={`Label of ${t.unitNumber}`}
                      >
                        label
                      </Link>
                    </td>
                    <td className="p-2">{t.kind === 'reefer' ? 'Reefer' : 'Dry van'}</td>
                    <td className="p-2">{t.ownerScac}</td>
                    <td className="p-2">
                      {t.status === 'in_yard'
                        ? `${t.terminalCode} ${t.spotLabel ?? ''}`
                        : t.status === 'on_road'
                          ? 'On the road'
                          : 'Gone'}
                    </td>
                    <td className="p-2 font-mono">{t.vin}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </form>
      )}
    </div>
  );
}
