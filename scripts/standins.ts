import path from 'node:path';

// Starts the local stand-ins of the hosted services in this process: the
// upload service (uploads-fake/) and the SMTP server (mail-fake/). Returns the
// environment the app needs to talk to them.

export type StandIns = { env: Record<string, string>; mailHttpUrl: string; close: () => Promise<void> };

export async function startStandIns(opts: { dataDir: string; ephemeralPorts?: boolean; quiet?: boolean }): Promise<StandIns> {
  const { startMailFake } = await import('../mail-fake/server');
  const mail = await startMailFake({
    smtpPort: opts.ephemeralPorts ? 0 : Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525),
    httpPort: opts.ephemeralPorts ? 0 : Number(process.env.MAIL_FAKE_HTTP_PORT ?? 3102),
    dataDir: path.join(opts.dataDir, 'mail'),
    log: opts.quiet ? () => undefined : undefined,
  });
  const { startUploadsFake } = await import('../uploads-fake/server');
  const { uploadsFakeEnv } = await import('../uploads-fake/token');
  const uploads = await startUploadsFake({
    port: opts.ephemeralPorts ? 0 : Number(process.env.UPLOADS_FAKE_PORT ?? 3101),
    dataDir: path.join(opts.dataDir, 'uploads'),
    log: opts.quiet ? () => undefined : undefined,
  });
  const env: Record<string, string> = {
    SMTP_URL: `smtp://127.0.0.1:${mail.smtpPort}`,
    MAIL_FAKE_URL: mail.httpUrl,
    UPLOADS_FAKE_DIR: path.resolve(opts.dataDir, 'uploads'),
    ...uploadsFakeEnv(uploads.url),
  };
  return {
    env,
    mailHttpUrl: mail.httpUrl,
    close: async () => {
      await Promise.allSettled([mail.close(), uploads.close()]);
    },
  };
}
