import Link from 'next/link';
import { useTranslations } from 'next-intl';

type Props = {
  trailer: {
    id: string;
    unitNumber: string;
    kind: string;
    status: string;
    ownerName: string;
    ownerScac: string;
    terminalName: string | null;
    spotLabel: string | null;
    isLoaded: boolean;
    fuelEighths: number | null;
  };
  kind: 'drop' | 'hook';
  suggested: 'drop' | 'hook';
};

export function TrailerSummary({ trailer, kind, suggested }: Props) {
  const t = useTranslations('Handoff.trailer');
  const other = kind === 'drop' ? 'hook' : 'drop';
  const place = [
    t('status', { status: trailer.status }),
    trailer.terminalName ? t('at', { terminal: trailer.terminalName }) : null,
  ]
    .filter(Boolean)
    .join(' ');
  return (
    <section aria-labelledby="trailer-title" className="space-y-2">
      <h1 id="trailer-title" className="text-gate-xl font-bold">
        {t('title', { kind, unit: trailer.unitNumber })}
      </h1>
      <p className="text-gate">
        {t('kindOf', { kind: trailer.kind, owner: trailer.ownerName, scac: trailer.ownerScac })}, {place}
        {trailer.spotLabel ? `, ${t('slot', { spot: trailer.spotLabel })}` : ''}.
      </p>
      {kind !== suggested ? (
        <p className="rounded-lg bg-warn-bg p-2 text-gate-sm text-warn">
          {t('suggests', { kind: suggested, status: trailer.status })}
        </p>
      ) : null}
      <Link
        href={`/gate/trailers/${trailer.id}?kind=${other}`}
        className="inline-flex min-h-tap items-center text-gate-sm font-bold text-brand underline"
      >
        {t('instead', { kind: other })}
      </Link>
    </section>
  );
}
