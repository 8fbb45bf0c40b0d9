import { defineConfig, devices } from '@playwright/test';
import { chromiumLaunchOptions } from './tests/support/chromium';

const port = Number(process.env.HM_APP_PORT ?? 3100);
export const baseURL = `http://localhost:${port}`;

export default defineConfig({
  testDir: 'tests/e2e',
  testMatch: '**/*.spec.ts',
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  // generous: a shared 2-core machine can be slow while a build or a database test runs beside it
  timeout: 90_000,
  expect: { timeout: 10_000 },
  reporter: [['list']],
  outputDir: '.data/test-results',
  use: {
    baseURL,
    trace: 'retain-on-failure',
    launchOptions: chromiumLaunchOptions,
  },
  projects: [
    // every journey on a phone: the gate and the yard are used on one
    { name: 'phone', use: { ...devices['Pixel 7'], browserName: 'chromium' } },
    // the screens also used at a desk: sign-in, the desk, the yard board, moves and the board's CSV.
    // Not the walk with the fake camera (a phone job, and slow).
    {
      name: 'desktop',
      use: { ...devices['Desktop Chrome'], browserName: 'chromium' },
      testMatch: ['auth.spec.ts', 'desk-case.spec.ts', 'yard-walk.spec.ts'],
      grepInvert: /jockey walks a row/,
    },
  ],
  webServer: {
    command: `node_modules/.bin/next start -p ${port}`,
    url: `${baseURL}/api/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    stdout: 'pipe',
    stderr: 'pipe',
  },
});
