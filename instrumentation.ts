// Runs once when the app server starts: retries e-mail that could not be sent.
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { env } = await import('./lib/env');
  env();
  const { startMailRetry } = await import('./lib/mail/retry');
  startMailRetry();
}
