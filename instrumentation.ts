import type { Instrumentation } from 'next';

// Runs once when a Next.js server starts: checks the settings (a bad one stops the start with a
// clear message), then runs a small loop that delivers the e-mail outbox and retries failures.
// Each app server runs it; claiming rows with SKIP LOCKED keeps them apart.
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { env } = await import('./lib/server/env');
  const settings = env();
  if (settings.HM_OUTBOX_WORKER === '0') return;
  const { deliverDueEmails } = await import('./lib/server/mail');
  let running = false;
  const tick = async () => {
    if (running) return;
    running = true;
    try {
      await deliverDueEmails();
    } catch (error) {
      console.error('[outbox] delivery round failed', error);
    } finally {
      running = false;
    }
  };
  setInterval(tick, settings.HM_OUTBOX_INTERVAL_MS).unref();
}

/** Every unexpected server error, logged with where it happened; pages show only its digest. */
export const onRequestError: Instrumentation.onRequestError = (error, request, context) => {
  const digest = (error as { digest?: string }).digest;
  console.error(
    `[request] ${request.method} ${request.path} failed in ${context.routeType} ${context.routePath}` +
      (digest ? ` (digest ${digest})` : ''),
    error,
  );
};
