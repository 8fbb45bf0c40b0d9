import { useTranslations } from 'next-intl';

export interface LabelCardProps {
  unitNumber: string;
  vin: string;
  ownerScac: string;
  link: string;
  /** The QR as an SVG string from `qrcode` (our own output, not user input). */
  qrSvg: string;
}

/** One printed trailer label: the unit number huge, the QR, the VIN and owner SCAC small. */
export function LabelCard({ unitNumber, vin, ownerScac, link, qrSvg }: LabelCardProps) {
  const t = useTranslations('Trailers');
  return (
    <figure
      data-label-link={link}
      aria-label={t('labels.card', { unit: unitNumber })}
      className="label-card flex flex-col items-center rounded-lg border-2 border-dashed border-paper-line bg-white p-4 text-black print:rounded-none print:border-ink-faint"
    >
      <p className="text-center font-bold leading-none tracking-tight text-[clamp(3rem,16vw,5.5rem)] print:text-[64pt]">
        {unitNumber}
      </p>
      <div
        className="mt-2 w-full max-w-[18rem] print:max-w-[2.9in] [&>svg]:h-auto [&>svg]:w-full"
        dangerouslySetInnerHTML={{ __html: qrSvg }}
      />
      <figcaption className="mt-1 text-center font-mono text-[0.8rem] leading-snug print:text-[8pt]">
        <span>{t('labels.vin', { vin })}</span>{' '}
        <span className="ml-2">{t('labels.owner', { scac: ownerScac })}</span>
        <span className="block text-ink-faint">{t('labels.cardFoot')}</span>
      </figcaption>
    </figure>
  );
}
