// Behind a transaction-pooling PgBouncer (docs/topology.md) the app's queries go through the pooler
// (DATABASE_URL) while the job worker keeps a direct session (DATABASE_SESSION_URL).
import { afterEach, describe, expect, it } from 'vitest';
import { databaseUrl, sessionDatabaseUrl } from '@/db/url';
import { env, reloadEnv } from '@/lib/server/env';

const saved = { ...process.env };
afterEach(() => {
  for (const k of ['DATABASE_URL', 'DATABASE_SESSION_URL', 'HM_DB_ROLE']) {
    if (saved[k] === undefined) delete process.env[k];
    else process.env[k] = saved[k];
  }
  reloadEnv();
});

describe('the job worker connection past the pooler', () => {
  it('is the app connection when no session URL is set', () => {
    delete process.env.DATABASE_URL;
    delete process.env.DATABASE_SESSION_URL;
    expect(sessionDatabaseUrl('hm_x')).toBe(databaseUrl('hm_x'));
    expect(sessionDatabaseUrl('hm_x')).toContain('/hm_x');
  });

  it('goes direct while the requests go through the pooler', () => {
    process.env.DATABASE_URL = 'postgres://hitchmark_app:pw@127.0.0.1:6432/hitchmark';
    process.env.DATABASE_SESSION_URL = 'postgres://hitchmark_app:pw@127.0.0.1:5432/hitchmark';
    expect(databaseUrl()).toBe('postgres://hitchmark_app:pw@127.0.0.1:6432/hitchmark');
    expect(sessionDatabaseUrl()).toBe('postgres://hitchmark_app:pw@127.0.0.1:5432/hitchmark');
  });

  it('refuses a session URL that is not a postgres:// URL, naming the setting', () => {
    process.env.DATABASE_SESSION_URL = 'mysql://127.0.0.1/hitchmark';
    reloadEnv();
    expect(() => env()).toThrow(/DATABASE_SESSION_URL must be a postgres:\/\/ URL/);
  });
});
