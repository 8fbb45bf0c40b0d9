import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { getLocale, getTranslations } from 'next-intl/server';
import { getDriverGateDefaults } from '@/db/queries/gate-defaults';
import { listOpenHolds } from '@/db/queries/handoffs';
import { listCarriers } from '@/db/queries/trailers';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { readable } from '@/lib/i18n/reasons';
import { requireUser } from '@/lib/server/auth';
import { getTrailerCondition } from '@/lib/server/handoffs/condition';
import { idParamSchema } from '@/lib/validation/handoffs';
import { HandoffForm } from './_components/handoff-form';
import { HoldList, HookRefused } from './_components/hook-refused';
import { TrailerSummary } from './_components/trailer-summary';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Handoff'))('metaTitle') };
}

export default async function HandoffStartPage({ params, searchParams }: PageProps<'/gate/trailers/[id]'>) {
  const user = await requireUser(SECTION_ROLES.gate);
  const id = idParamSchema.safeParse((await params).id);
  if (!id.success) notFound();
  const locale = await getLocale();
  const condition = await getTrailerCondition(id.data, user.role, locale);
  if (!condition) notFound();
  const { trailer } = condition;
  const asked = (await searchParams).kind;
  const suggested = trailer.status === 'in_yard' ? 'hook' : 'drop';
  const kind = asked === 'drop' || asked === 'hook' ? asked : suggested;
  // stored reasons and cautions in the reader's language (lib/i18n/reasons.ts)
  const holds = readable(await listOpenHolds(trailer.id), locale, user.terminalTimeZone ?? 'UTC');
  const outOfService = holds.filter((h) => h.severity === 'out_of_service');
  const yardOnly = holds.filter((h) => h.severity === 'restricted' && h.restriction === 'yard_only');
  const restricted = holds.filter((h) => h.severity === 'restricted');
  // out of service first; a "yard moves only" hold refuses a hook the same way
  const refusing = outOfService.length ? outOfService : yardOnly;
  const carriers = user.role === 'driver' ? [] : await listCarriers();
  const gateDefaults =
    user.role === 'driver' ? await getDriverGateDefaults(user.id) : { tractorNumber: null };

  return (
    <div className="mx-auto max-w-xl space-y-4">
      <TrailerSummary trailer={trailer} kind={kind} suggested={suggested} />
      {kind === 'hook' && refusing.length ? (
        <HookRefused unitNumber={trailer.unitNumber} holds={refusing} />
      ) : (
        <>
          {restricted.length ? <HoldList holds={restricted} /> : null}
          <HandoffForm
            condition={condition}
            kind={kind}
            asksPerishable={kind === 'hook' && restricted.some((h) => h.restriction === 'no_perishable')}
            carriers={carriers}
            timeZone={user.terminalTimeZone ?? 'UTC'}
            defaults={{
              carrierId: user.role === 'driver' ? (user.carrierId ?? '') : '',
              driverName: user.role === 'driver' ? user.name : '',
              isDriver: user.role === 'driver',
              carrierName: user.carrierName,
              tractorNumber: gateDefaults.tractorNumber,
            }}
          />
        </>
      )}
    </div>
  );
}
