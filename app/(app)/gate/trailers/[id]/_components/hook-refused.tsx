import { useTranslations } from 'next-intl';
import { ButtonLink } from '@/app/_components/button';
import { Caution } from '@/app/_components/caution';

type HoldRow = {
  id: string;
  severity: 'out_of_service' | 'restricted';
  restriction: string | null;
  reason: string;
  caution?: string | null;
};

/** The open holds of a trailer, each with its restriction, its reason and its caution. */
export function HoldList({ title, holds }: { title?: string; holds: HoldRow[] }) {
  const t = useTranslations('Handoff.hold');
  const heading = title ?? t('restricted');
  return (
    <section aria-label={heading} className="rounded-lg border-2 border-hold bg-hold-bg p-3 text-hold">
      <h2 className="text-gate-lg font-bold">{heading}</h2>
      <ul className="mt-1 list-disc space-y-1 pl-6 text-gate">
        {holds.map((h) => (
          <li key={h.id}>
            {h.severity === 'restricted' && h.restriction
              ? `${t('restriction', { restriction: h.restriction })}: `
              : ''}
            {h.reason}
            {h.caution ? <p className="mt-1 text-gate-sm text-ink">⚠ {h.caution}</p> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}

/** A hook of an out-of-service or "yard moves only" trailer stops here, before the form. */
export function HookRefused({ unitNumber, holds }: { unitNumber: string; holds: HoldRow[] }) {
  const t = useTranslations('Handoff.hold');
  const c = useTranslations('Cautions');
  const isOutOfService = holds.some((h) => h.severity === 'out_of_service');
  return (
    <div className="space-y-3" role="alert">
      <div className="rounded-lg border-4 border-danger bg-danger-bg p-3 text-danger">
        <p className="text-gate-xl font-bold">{t('refused')}</p>
        <p className="text-gate font-bold">
          {t(isOutOfService ? 'outOfService' : 'yardOnly', { unit: unitNumber })}
        </p>
      </div>
      <HoldList title={t('why')} holds={holds} />
      {isOutOfService ? (
        <Caution title={t('outOfServiceTitle')}>{c('outOfService')}</Caution>
      ) : (
        <Caution title={t('yardOnlyTitle')}>{c('yardOnly')}</Caution>
      )}
      <Caution title={c('titles.inspection')}>{c('inspection')}</Caution>
      <p className="text-gate">{t('askClerk')}</p>
      <ButtonLink href="/gate" variant="secondary" className="w-full">
        {t('backToGate')}
      </ButtonLink>
    </div>
  );
}
