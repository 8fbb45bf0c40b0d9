// The demo fleet: 300 invented trailers with valid VINs, each with a printed label.
import { db } from '@/db';
import { labels, trailers } from '@/db/schema';
import { computeVinCheckDigit } from '@/lib/engine/identity';

const VIN_CHARS = '0123456789ABCDEFGHJKLMNPRSTUVWXYZ';

/** A VIN with a valid 565.15 check digit; "1B9" is an invented small-manufacturer prefix. */
function demoVin(serial: number, yearCode: string): string {
  const serialPart = String(100000 + serial).slice(-6);
  const body = `1B9RF5322${yearCode}R${VIN_CHARS[serial % 10]}${serialPart.slice(1)}`.slice(0, 17);
  const vin = body.split('');
  vin[8] = computeVinCheckDigit(body);
  return vin.join('');
}

/** Inserts the trailers missing so far; labels once, for every trailer. */
export async function seedFleet(carrierIds: Record<string, string>) {
  // 300 trailers: 270 of the home carrier, 30 owned by outside carriers (interchanged equipment).
  const yearCodes = ['F', 'G', 'H', 'J', 'K', 'L', 'M', 'N', 'P', 'R'];
  const rows = Array.from({ length: 300 }, (_, i) => {
    const owner = i < 270 ? 'BRCL' : ['OSFW', 'PLRD', 'VNTA'][i % 3];
    const isReefer = i % 10 !== 9;
    return {
      unitNumber: owner === 'BRCL' ? `R${53001 + i}` : `${owner.slice(0, 2)}${7100 + i}`,
      vin: demoVin(i + 1, yearCodes[i % yearCodes.length]),
      plate: `${['KX', 'TR', 'WM'][i % 3]}${String(40000 + i * 7).slice(-5)}`,
      plateState: ['IL', 'MO', 'CO', 'KS'][i % 4],
      kind: isReefer ? ('reefer' as const) : ('dry_van' as const),
      ownerCarrierId: carrierIds[owner],
      fuelTankGallons: isReefer ? [50, 50, 50, 55, 40][i % 5] : 0,
      hingesPerDoor: i % 4 === 0 ? 5 : 4,
      tireLayout: i % 7 === 0 ? ('wide_single' as const) : ('dual' as const),
    };
  });
  await db.insert(trailers).values(rows).onConflictDoNothing();

  const existingLabels = await db.select({ id: labels.id }).from(labels).limit(1);
  if (existingLabels.length === 0) {
    const all = await db.select({ id: trailers.id }).from(trailers);
    await db.insert(labels).values(all.map((t) => ({ trailerId: t.id })));
  }
}
