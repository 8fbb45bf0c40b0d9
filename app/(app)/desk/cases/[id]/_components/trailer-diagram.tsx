// Hitchmark's own drawing of a reefer trailer, nose to the left, seen from above and from its left
// side, with the zones that have damage in this case filled in.
import { useTranslations } from 'next-intl';

type Props = { damagedZones: string[]; isReefer: boolean; axles: number };

/** A zone's name in the reader's language (the Checklist catalogue); the key when it has none. */
function useZoneName() {
  const z = useTranslations('Checklist');
  return (zone: string) => (z.has(`zones.${zone}`) ? z(`zones.${zone}`) : zone);
}

/** One zone of the drawing: filled red when this case has damage there. */
function Zone({ zone, hit, children }: { zone: string; hit: Set<string>; children: React.ReactNode }) {
  const t = useTranslations('Case');
  const zoneName = useZoneName();
  const isDamaged = hit.has(zone);
  return (
    <g
      className={isDamaged ? 'fill-danger/70 stroke-danger' : 'fill-paper-dim stroke-ink-faint'}
      strokeWidth={2}
      data-zone={zone}
      data-damaged={isDamaged || undefined}
    >
      <title>{isDamaged ? t('diagram.damaged', { zone: zoneName(zone) }) : zoneName(zone)}</title>
      {children}
    </g>
  );
}

export function TrailerDiagram({ damagedZones, isReefer, axles }: Props) {
  const t = useTranslations('Case');
  const zoneName = useZoneName();
  const hit = new Set(damagedZones);
  const label = damagedZones.length
    ? t('diagram.damageAt', { zones: damagedZones.map(zoneName).join(', ') })
    : t('diagram.noZone');
  const wheelXs = Array.from({ length: Math.max(1, Math.min(axles, 3)) }, (_, i) => 470 - i * 34);
  return (
    <figure className="rounded-xl bg-paper p-3">
      <svg
        viewBox="0 0 600 330"
        role="img"
        aria-label={t('diagram.label', { detail: label })}
        className="h-auto w-full max-w-2xl"
      >
        <text x="10" y="18" className="fill-ink text-[14px] font-bold">
          {t('diagram.above')}
        </text>
        {isReefer ? (
          <Zone zone="reefer_unit" hit={hit}>
            <rect x="22" y="48" width="22" height="74" rx="4" />
          </Zone>
        ) : null}
        <Zone zone="nose" hit={hit}>
          <rect x="46" y="34" width="14" height="102" />
        </Zone>
        <Zone zone="right_side" hit={hit}>
          <rect x="60" y="34" width="480" height="14" />
        </Zone>
        <Zone zone="interior" hit={hit}>
          <rect x="60" y="48" width="480" height="74" />
        </Zone>
        <Zone zone="left_side" hit={hit}>
          <rect x="60" y="122" width="480" height="14" />
        </Zone>
        <Zone zone="rear" hit={hit}>
          <rect x="540" y="34" width="16" height="102" />
        </Zone>
        <text x="300" y="30" textAnchor="middle" className="fill-ink-soft text-[12px]">
          {t('diagram.rightSide')}
        </text>
        <text x="300" y="152" textAnchor="middle" className="fill-ink-soft text-[12px]">
          {t('diagram.leftSide')}
        </text>

        <text x="10" y="186" className="fill-ink text-[14px] font-bold">
          {t('diagram.sideView')}
        </text>
        {isReefer ? (
          <Zone zone="reefer_unit" hit={hit}>
            <rect x="22" y="208" width="22" height="50" rx="4" />
          </Zone>
        ) : null}
        <Zone zone="nose" hit={hit}>
          <rect x="46" y="198" width="14" height="82" />
        </Zone>
        <Zone zone="left_side" hit={hit}>
          <rect x="60" y="198" width="480" height="82" />
        </Zone>
        <Zone zone="rear" hit={hit}>
          <rect x="540" y="198" width="16" height="82" />
        </Zone>
        <Zone zone="undercarriage" hit={hit}>
          <rect x="120" y="280" width="20" height="32" />
          <rect x="200" y="280" width="70" height="16" rx="6" />
          <rect x="400" y="280" width="110" height="10" />
        </Zone>
        <Zone zone="tires" hit={hit}>
          {wheelXs.map((x) => (
            <circle key={x} cx={x} cy={304} r={15} />
          ))}
        </Zone>
      </svg>
      <figcaption className="mt-1 text-gate-sm text-ink-soft">
        {t('diagram.caption', { detail: label })}
      </figcaption>
    </figure>
  );
}
