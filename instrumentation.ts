// Runs once when a Next.js server starts: a small loop that delivers the e-mail outbox and
// retries failures. Each app server runs it; claiming rows with SKIP LOCKED keeps them apart.
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs' || process.env.HM_OUTBOX_WORKER === '0') return;
  const { deliverDueEmails } = await import('./lib/server/mail');
  const everyMs = Number(process.env.HM_OUTBOX_INTERVAL_MS ?? 5_000);
  let running = false;
  const tick = async () => {
    if (running) return;
    running = true;
    try {
      await deliverDueEmails();
    } catch (error) {
      console.error('outbox delivery failed', error);
    } finally {
      running = false;
    }
  };
  setInterval(tick, everyMs).unref();
}
