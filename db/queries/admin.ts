import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { carriers, users } from '@/db/schema';

export async function listUsers() {
  return db
    .select({
      id: users.id,
      name: users.name,
      role: users.role,
      email: users.email,
      driverNumber: users.driverNumber,
      carrierScac: carriers.scac,
      isActive: users.isActive,
    })
    .from(users)
    .leftJoin(carriers, eq(carriers.id, users.carrierId))
    .orderBy(asc(users.role), asc(users.name));
}

export async function listCarriers() {
  return db
    .select({
      id: carriers.id,
      scac: carriers.scac,
      name: carriers.name,
      contactEmail: carriers.contactEmail,
    })
    .from(carriers)
    .orderBy(asc(carriers.scac));
}
