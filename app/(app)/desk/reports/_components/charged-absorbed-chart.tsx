import { useTranslations } from 'next-intl';
import { formatMoney } from '@/lib/format/money';

type Bar = { label: string; chargedCents: number; absorbedCents: number };

/** Hitchmark's own grouped bars: charged to carriers vs absorbed by the terminal, per group. */
export function ChargedAbsorbedChart({ bars, title }: { bars: Bar[]; title: string }) {
  const t = useTranslations('Desk');
  const max = Math.max(1, ...bars.flatMap((b) => [b.chargedCents, b.absorbedCents]));
  const rowH = 44;
  const height = bars.length * rowH + 30;
  const scale = (c: number) => Math.round((c / max) * 360);
  return (
    <figure className="rounded-xl bg-paper p-3">
      <figcaption className="text-gate font-bold">{title}</figcaption>
      <svg
        viewBox={`0 0 600 ${height}`}
        role="img"
        aria-label={`${title}: ${bars.map((b) => t('report.bar', { label: b.label, charged: formatMoney(b.chargedCents), absorbed: formatMoney(b.absorbedCents) })).join('; ')}`}
        className="mt-2 h-auto w-full"
      >
        {bars.map((b, i) => {
          const y = i * rowH + 4;
          return (
            <g key={b.label}>
              <text x="0" y={y + 22} className="fill-ink text-[14px] font-bold">
                {b.label}
              </text>
              <rect x="90" y={y} width={scale(b.chargedCents)} height="16" className="fill-brand" />
              <text x={96 + scale(b.chargedCents)} y={y + 13} className="fill-ink text-[12px]">
                {formatMoney(b.chargedCents)}
              </text>
              <rect x="90" y={y + 18} width={scale(b.absorbedCents)} height="16" className="fill-warn" />
              <text x={96 + scale(b.absorbedCents)} y={y + 31} className="fill-ink text-[12px]">
                {formatMoney(b.absorbedCents)}
              </text>
            </g>
          );
        })}
        <g transform={`translate(90 ${height - 14})`}>
          <rect width="12" height="12" className="fill-brand" />
          <text x="16" y="11" className="fill-ink text-[12px]">
            {t('report.chargedLegend')}
          </text>
          <rect x="170" width="12" height="12" className="fill-warn" />
          <text x="186" y="11" className="fill-ink text-[12px]">
            {t('report.absorbedLegend')}
          </text>
        </g>
      </svg>
    </figure>
  );
}
