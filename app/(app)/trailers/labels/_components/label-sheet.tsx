import { labelLink } from '@/lib/server/labels';
import { labelQrSvg } from '@/lib/labels/qr';
import { LabelCard } from './label-card';

export interface SheetTrailer {
  id: string;
  unitNumber: string;
  vin: string;
  ownerScac: string;
  labelId: string;
}

/** The printable grid: one column on a phone, two per row on paper (four per Letter page). */
export async function LabelSheet({ trailers }: { trailers: SheetTrailer[] }) {
  const cards = await Promise.all(
    trailers.map(async (t) => {
      const link = labelLink({ id: t.labelId, trailerId: t.id });
      return { ...t, link, qrSvg: await labelQrSvg(link) };
    }),
  );
  return (
    <div className="label-sheet grid gap-4 sm:grid-cols-2 print:grid-cols-2 print:gap-0">
      {cards.map((c) => (
        <LabelCard
          key={c.id}
          unitNumber={c.unitNumber}
          vin={c.vin}
          ownerScac={c.ownerScac}
          link={c.link}
          qrSvg={c.qrSvg}
        />
      ))}
    </div>
  );
}
