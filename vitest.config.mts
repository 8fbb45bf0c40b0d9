import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Two projects sharing these settings: the pure tests, and the database tests (tests/unit/db),
// each file of which gets its own copy of a template database made once per run.
export default defineConfig({
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('./', import.meta.url)),
      // `server-only` throws outside a React Server Components bundle; tests import query modules directly.
      'server-only': fileURLToPath(new URL('./tests/unit/server-only-stub.ts', import.meta.url)),
      // next-intl's server functions only work inside Next's server bundle; see the stub's comment.
      'next-intl/server': fileURLToPath(new URL('./tests/unit/next-intl-server-stub.ts', import.meta.url)),
    },
  },
  test: {
    environment: 'node',
    testTimeout: 20_000,
    hookTimeout: 60_000,
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['tests/**/*.test.ts'], exclude: ['tests/unit/db/**'] },
      },
      {
        extends: true,
        test: {
          name: 'db',
          include: ['tests/unit/db/**/*.test.ts'],
          globalSetup: ['tests/unit/global-setup.ts'],
          setupFiles: ['tests/unit/database-per-file.ts'],
        },
      },
    ],
  },
});
