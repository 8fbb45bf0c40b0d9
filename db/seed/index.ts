// Demo data: an invented reefer carrier, Bramblecrest Cold Lines, with two terminals, ~300
// trailers and a few outside carriers. Every name, number and place here is made up.
// Safe to re-run: rows are keyed by natural keys and inserted only when missing.
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import bcrypt from 'bcryptjs';
import { and, eq } from 'drizzle-orm';
import { computeVinCheckDigit } from '@/lib/engine/identity';
import { defaultPolicy } from '@/lib/engine/policy';
import { db, pool } from '@/db';
import {
  carriers,
  labels,
  policies,
  rateCard,
  terminals,
  trailers,
  users,
  yardRows,
  yardSpots,
} from '@/db/schema';
import { seedDesk } from './desk';
import { seedHistory } from './history';

export const DEMO_ACCOUNTS = [
  {
    role: 'admin',
    name: 'Morgan Achterberg',
    email: 'admin@bramblecrest.example',
    secret: 'hitchmark-admin',
  },
  {
    role: 'clerk',
    name: 'Priya Venkataraman-Holt',
    email: 'clerk@bramblecrest.example',
    secret: 'hitchmark-clerk',
  },
  {
    role: 'jockey',
    name: 'Tobias Quenneville',
    email: 'jockey@bramblecrest.example',
    secret: 'hitchmark-jockey',
  },
  { role: 'driver', name: 'Dana Okonkwo-Reyes', driverNumber: 'D1001', secret: '4321', carrier: 'BRCL' },
  { role: 'driver', name: 'Lev Marchetti', driverNumber: 'D2001', secret: '2468', carrier: 'OSFW' },
] as const;

const CARRIERS = [
  {
    scac: 'BRCL',
    name: 'Bramblecrest Cold Lines',
    contactEmail: 'claims@bramblecrest.example',
    isHomeCarrier: true,
  },
  {
    scac: 'OSFW',
    name: 'Osterlind Freightways',
    contactEmail: 'equipment@osterlind.example',
    isHomeCarrier: false,
  },
  {
    scac: 'PLRD',
    name: 'Pellucid Road Carriers',
    contactEmail: 'safety@pellucid-road.example',
    isHomeCarrier: false,
  },
  { scac: 'VNTA', name: 'Vantorra Haulage', contactEmail: 'dispatch@vantorra.example', isHomeCarrier: false },
];

const TERMINALS = [
  {
    code: 'RVB',
    name: 'Riverbend terminal',
    timeZone: 'America/Chicago',
    rows: ['A', 'B', 'C', 'D', 'E', 'F'],
    slotsPerRow: 24,
    doors: 12,
  },
  {
    code: 'HMS',
    name: 'High Mesa terminal',
    timeZone: 'America/Denver',
    rows: ['A', 'B', 'C', 'D'],
    slotsPerRow: 16,
    doors: 8,
  },
];

const EXTRA_DRIVERS = [
  { name: 'Ines Halvorsen', driverNumber: 'D1002', carrier: 'BRCL' },
  { name: 'Kwame Adeyemi-Fitch', driverNumber: 'D1003', carrier: 'BRCL' },
  { name: 'Rosalind Etxeberria', driverNumber: 'D1004', carrier: 'BRCL' },
  { name: 'Yusuf Lindqvist', driverNumber: 'D2002', carrier: 'OSFW' },
  { name: 'Carmen Oyelaran', driverNumber: 'D3001', carrier: 'PLRD' },
  { name: 'Piet Varga-Molina', driverNumber: 'D4001', carrier: 'VNTA' },
];
const EXTRA_DRIVER_PIN = '1357';

/** Repair prices, in cents (invented demo figures, not a market survey). */
const RATES: {
  itemPattern: string;
  condition: 'minor' | 'damaged' | 'unsafe' | 'missing';
  amountCents: number;
}[] = [
  { itemPattern: 'side', condition: 'damaged', amountCents: 85_000 },
  { itemPattern: 'side', condition: 'unsafe', amountCents: 160_000 },
  // item keys are left_side.* / right_side.*: rates apply to dot-separated key prefixes (lib/desk/estimate.ts)
  { itemPattern: 'left_side', condition: 'damaged', amountCents: 85_000 },
  { itemPattern: 'left_side', condition: 'unsafe', amountCents: 160_000 },
  { itemPattern: 'right_side', condition: 'damaged', amountCents: 85_000 },
  { itemPattern: 'right_side', condition: 'unsafe', amountCents: 160_000 },
  { itemPattern: 'rear.header', condition: 'damaged', amountCents: 62_000 },
  { itemPattern: 'reefer_unit', condition: 'damaged', amountCents: 95_000 },
  { itemPattern: 'rear', condition: 'damaged', amountCents: 45_000 },
  { itemPattern: 'rear', condition: 'unsafe', amountCents: 90_000 },
  { itemPattern: 'rear', condition: 'missing', amountCents: 30_000 },
  { itemPattern: 'interior', condition: 'damaged', amountCents: 120_000 },
  { itemPattern: 'interior', condition: 'unsafe', amountCents: 240_000 },
  { itemPattern: 'undercarriage', condition: 'damaged', amountCents: 55_000 },
  { itemPattern: 'undercarriage', condition: 'unsafe', amountCents: 75_000 },
  { itemPattern: 'undercarriage', condition: 'missing', amountCents: 42_000 },
  { itemPattern: 'tires', condition: 'damaged', amountCents: 38_000 },
  { itemPattern: 'tires', condition: 'unsafe', amountCents: 52_000 },
  { itemPattern: 'tires', condition: 'missing', amountCents: 52_000 },
  { itemPattern: 'nose', condition: 'damaged', amountCents: 65_000 },
  { itemPattern: 'nose', condition: 'unsafe', amountCents: 130_000 },
];

const VIN_CHARS = '0123456789ABCDEFGHJKLMNPRSTUVWXYZ';

/** A VIN with a valid 565.15 check digit; "1B9" is an invented small-manufacturer prefix. */
export function demoVin(serial: number, yearCode: string): string {
  const serialPart = String(100000 + serial).slice(-6);
  const body = `1B9RF5322${yearCode}R${VIN_CHARS[serial % 10]}${serialPart.slice(1)}`.slice(0, 17);
  const vin = body.split('');
  vin[8] = computeVinCheckDigit(body);
  return vin.join('');
}

async function upsertBy<T extends Record<string, unknown>>(
  insert: () => Promise<T[]>,
  find: () => Promise<T[]>,
): Promise<T> {
  const [row] = await insert();
  if (row) return row;
  const [existing] = await find();
  return existing;
}

export async function seed() {
  const hashes = new Map<string, string>();
  const hash = async (s: string) => hashes.get(s) ?? hashes.set(s, await bcrypt.hash(s, 10)).get(s)!;

  const carrierIds: Record<string, string> = {};
  for (const c of CARRIERS) {
    const row = await upsertBy(
      () => db.insert(carriers).values(c).onConflictDoNothing().returning({ id: carriers.id }),
      () => db.select({ id: carriers.id }).from(carriers).where(eq(carriers.scac, c.scac)),
    );
    carrierIds[c.scac] = row.id;
  }

  const terminalIds: Record<string, string> = {};
  for (const t of TERMINALS) {
    const row = await upsertBy(
      () =>
        db
          .insert(terminals)
          .values({ code: t.code, name: t.name, timeZone: t.timeZone })
          .onConflictDoNothing()
          .returning({ id: terminals.id }),
      () => db.select({ id: terminals.id }).from(terminals).where(eq(terminals.code, t.code)),
    );
    terminalIds[t.code] = row.id;
    await db
      .insert(policies)
      .values({
        terminalId: row.id,
        data: { ...defaultPolicy, freeTimeHours: 48, disputeWindowDays: 14, lowFuelEighths: 4 },
      })
      .onConflictDoNothing();
    for (const [i, name] of t.rows.entries()) {
      const r = await upsertBy(
        () =>
          db
            .insert(yardRows)
            .values({ terminalId: row.id, name: `Row ${name}`, sortOrder: i })
            .onConflictDoNothing()
            .returning({ id: yardRows.id }),
        () =>
          db
            .select({ id: yardRows.id })
            .from(yardRows)
            .where(and(eq(yardRows.terminalId, row.id), eq(yardRows.name, `Row ${name}`))),
      );
      const slots = Array.from({ length: t.slotsPerRow }, (_, s) => ({
        terminalId: row.id,
        rowId: r.id,
        kind: 'slot' as const,
        label: `${name}${String(s + 1).padStart(2, '0')}`,
        sortOrder: s,
      }));
      await db.insert(yardSpots).values(slots).onConflictDoNothing();
    }
    const doors = Array.from({ length: t.doors }, (_, d) => ({
      terminalId: row.id,
      kind: 'door' as const,
      label: `Door ${d + 1}`,
      sortOrder: d,
    }));
    await db.insert(yardSpots).values(doors).onConflictDoNothing();
  }

  const home = terminalIds.RVB;
  for (const a of DEMO_ACCOUNTS) {
    await db
      .insert(users)
      .values({
        name: a.name,
        role: a.role,
        email: 'email' in a ? a.email : null,
        driverNumber: 'driverNumber' in a ? a.driverNumber : null,
        secretHash: await hash(a.secret),
        homeTerminalId: home,
        carrierId: 'carrier' in a ? carrierIds[a.carrier] : carrierIds.BRCL,
      })
      .onConflictDoNothing();
  }
  for (const d of EXTRA_DRIVERS) {
    await db
      .insert(users)
      .values({
        name: d.name,
        driverNumber: d.driverNumber,
        role: 'driver',
        carrierId: carrierIds[d.carrier],
        homeTerminalId: home,
        secretHash: await hash(EXTRA_DRIVER_PIN),
      })
      .onConflictDoNothing();
  }

  await db.insert(rateCard).values(RATES).onConflictDoNothing();

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

  await seedHistory({ terminalIds, carrierIds });
  await seedDesk();
}

const isMain = !!process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href;
if (isMain) {
  const started = Date.now();
  await seed();
  await pool.end();
  console.log(`demo data seeded in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}
