import { labelQrSvg } from '@/lib/labels/qr';
import { labelLink, type SheetTrailer } from '@/lib/server/labels';
import { LabelCard } from './label-card';

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
