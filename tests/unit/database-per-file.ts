// Vitest setup file of the database tests: before the test file imports `@/db`, a fresh copy of
// the template database is made for this file alone; it is dropped when the file is done.
import { randomUUID } from 'node:crypto';
import { afterAll, inject } from 'vitest';
import { createDatabase, dropDatabase, FILE_DB_PREFIX, pointAtDatabase } from './test-databases';

const name = `${FILE_DB_PREFIX}${randomUUID().slice(0, 8)}`;
await createDatabase(name, inject('templateDb'));
pointAtDatabase(name);
// db/index.ts keeps its pool on globalThis outside production; never reuse another file's
delete (globalThis as { hitchmarkDb?: unknown }).hitchmarkDb;

afterAll(async () => {
  await dropDatabase(name);
});
