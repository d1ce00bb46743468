// Runs once when the app server starts: stamps requests with their socket's
// address (for throttling), retries e-mail that could not be sent, and backs
// the database up on a schedule when BACKUP_EVERY_HOURS asks for it.
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { env } = await import('./lib/env');
  env();
  const { installPeerHeader } = await import('./lib/http/peerHeader');
  installPeerHeader();
  const { startMailRetry } = await import('./lib/mail/retry');
  startMailRetry();
  const { startBackupSchedule } = await import('./lib/backup/schedule');
  startBackupSchedule();
}
