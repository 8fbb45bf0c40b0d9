// Demo data: an invented reefer carrier, Bramblecrest Cold Lines, with two terminals, ~300
// trailers and a few outside carriers. Every name, number and place here is made up.
// Safe to re-run: rows are keyed by natural keys and inserted only when missing.
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import bcrypt from 'bcryptjs';
import { eq } from 'drizzle-orm';
import { db, pool } from '@/db';
import { carriers, rateCard, users } from '@/db/schema';
import { seedDesk } from './desk';
import { seedFleet } from './fleet';
import { seedHistory } from './history';
import { seedTerminals } from './terminals';
import { upsertBy } from './upsert';

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
  // no carrier editor yet: the demo's one Spanish-reading contact gets receipts and case mail in Spanish
  {
    scac: 'VNTA',
    name: 'Vantorra Haulage',
    contactEmail: 'dispatch@vantorra.example',
    isHomeCarrier: false,
    locale: 'es',
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

  const terminalIds = await seedTerminals();
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

  await seedFleet(carrierIds);
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
