// Local SMTP stand-in: accepts every message on loopback (no auth, no TLS), keeps
// it, and lists it over HTTP for the dev mailbox page and for tests.
// Runnable: `npx tsx mail-fake/server.ts`.
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { MailStore } from './store';

export type MailFakeOptions = {
  smtpPort?: number;
  httpPort?: number;
  // JSON-lines file the messages are kept in…
  store?: string;
  // …or a directory to keep `messages.jsonl` in (ignored when `store` is given).
  dataDir?: string;
  log?: (line: string) => void;
};

export type MailFake = {
  smtpPort: number;
  httpPort: number;
  // Base of the HTTP listing, e.g. http://127.0.0.1:3102 (`httpUrl` is the same).
  url: string;
  httpUrl: string;
  store: MailStore;
  close(): Promise<void>;
};

const HOST = '127.0.0.1';
const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

function isLoopback(address: string): boolean {
  return address === '127.0.0.1' || address === '::1' || address === '::ffff:127.0.0.1';
}

function startSmtp(store: MailStore, port: number, log: (line: string) => void): Promise<SMTPServer> {
  const smtp = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    banner: 'Pourproof local mail stand-in',
    onConnect(session, callback) {
      callback(isLoopback(session.remoteAddress) ? null : new Error('Loopback only'));
    },
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const stored = await store.add({
            from: parsed.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            messageId: parsed.messageId ? parsed.messageId.replace(/^<|>$/g, '') : null,
          });
          log(`[mail-fake] message to ${stored.to.join(', ')}: ${stored.subject}`);
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  return new Promise((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(port, HOST, () => resolve(smtp));
  });
}

function startHttp(store: MailStore, port: number, log: (line: string) => void): Promise<Server> {
  const server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://fake.invalid');
    res.on('close', () => log(`[mail-fake] ${req.method} ${url.pathname} ${res.statusCode}`));
    if (url.pathname !== '/messages') {
      res.writeHead(404, { 'content-type': 'application/json' });
      return res.end(JSON.stringify({ error: 'Try GET or DELETE /messages' }));
    }
    if (req.method === 'GET') {
      res.writeHead(200, { 'content-type': 'application/json', 'cache-control': 'no-store' });
      return res.end(JSON.stringify(store.newestFirst(url.searchParams.get('to') ?? undefined)));
    }
    if (req.method === 'DELETE') {
      return void store.clear().then(
        () => res.writeHead(204).end(),
        () => res.writeHead(500).end(),
      );
    }
    res.writeHead(405, { allow: 'GET, DELETE' }).end();
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, HOST, () => resolve(server));
  });
}

export async function startMailFake(options: MailFakeOptions = {}): Promise<MailFake> {
  const log = options.log ?? ((line: string) => console.log(line));
  const file = options.store ?? path.join(options.dataDir ?? './data/mail', 'messages.jsonl');
  const store = new MailStore(path.resolve(file));
  await store.load();
  const smtp = await startSmtp(store, options.smtpPort ?? 2525, log);
  const http = await startHttp(store, options.httpPort ?? 3102, log).catch(async (err: unknown) => {
    await new Promise<void>((r) => smtp.close(() => r()));
    throw err;
  });
  const httpPort = (http.address() as AddressInfo).port;
  return {
    smtpPort: (smtp.server.address() as AddressInfo).port,
    httpPort,
    url: `http://${HOST}:${httpPort}`,
    httpUrl: `http://${HOST}:${httpPort}`,
    store,
    close: async () => {
      await new Promise<void>((r) => smtp.close(() => r()));
      await new Promise<void>((resolve, reject) => {
        http.close((err) => (err ? reject(err) : resolve()));
        http.closeAllConnections();
      });
    },
  };
}

const isMain = process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href;

if (isMain) {
  startMailFake({
    smtpPort: Number(process.env.MAIL_FAKE_SMTP_PORT ?? 2525),
    httpPort: Number(process.env.MAIL_FAKE_HTTP_PORT ?? 3102),
    store: process.env.MAIL_FAKE_STORE,
    dataDir: process.env.MAIL_FAKE_DATA_DIR,
  })
    .then((fake) => {
      console.log(`[mail-fake] SMTP on ${HOST}:${fake.smtpPort}, messages at ${fake.url}/messages (${fake.store.file})`);
      const stop = () => void fake.close().then(() => process.exit(0));
      process.on('SIGINT', stop);
      process.on('SIGTERM', stop);
    })
    .catch((err: unknown) => {
      console.error('[mail-fake] could not start:', err);
      process.exit(1);
    });
}
