import type { IncomingMessage, ServerResponse } from 'node:http';

export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
  ) {
    super(message);
  }
}

export function sendJson(res: ServerResponse, status: number, body: unknown): void {
  const text = JSON.stringify(body);
  res.writeHead(status, { 'content-type': 'application/json', 'content-length': Buffer.byteLength(text) });
  res.end(text);
}

// The hosted service answers errors as `{ error: message }`; the browser client
// treats any JSON body with an `error` property as a failed upload.
export function sendError(res: ServerResponse, status: number, message: string): void {
  if (!res.headersSent) sendJson(res, status, { error: message });
  else res.end();
}

export async function readBody(req: IncomingMessage, limit: number): Promise<Buffer> {
  const declared = Number(req.headers['content-length']);
  if (Number.isFinite(declared) && declared > limit) throw new HttpError(413, 'Body too large');
  const chunks: Buffer[] = [];
  let total = 0;
  for await (const chunk of req) {
    const buf = chunk as Buffer;
    total += buf.length;
    if (total > limit) throw new HttpError(413, 'Body too large');
    chunks.push(buf);
  }
  return Buffer.concat(chunks);
}

export async function readJson(req: IncomingMessage, limit = 256 * 1024): Promise<Record<string, unknown>> {
  const raw = (await readBody(req, limit)).toString('utf8');
  try {
    const data: unknown = raw ? JSON.parse(raw) : {};
    if (data && typeof data === 'object' && !Array.isArray(data)) return data as Record<string, unknown>;
  } catch {
    // fall through
  }
  throw new HttpError(400, 'Body must be a JSON object');
}

// The app runs on another port, so the browser needs CORS for the PUT (which has
// custom headers, hence a preflight), for reading `x-ut-range-start` after the
// resume HEAD, and for drawing served images onto a canvas without tainting it.
export function applyCors(req: IncomingMessage, res: ServerResponse): void {
  res.setHeader('access-control-allow-origin', '*');
  res.setHeader('access-control-expose-headers', 'x-ut-range-start, x-uploadthing-version, content-length');
  if (req.method === 'OPTIONS') {
    res.setHeader('access-control-allow-methods', 'GET, HEAD, PUT, POST, OPTIONS');
    res.setHeader(
      'access-control-allow-headers',
      req.headers['access-control-request-headers'] ?? 'content-type, range, x-uploadthing-version',
    );
    res.setHeader('access-control-max-age', '600');
  }
}

export function logRequests(req: IncomingMessage, res: ServerResponse, log: (line: string) => void): void {
  const started = Date.now();
  // Only the path: query strings carry signatures.
  const pathOnly = (req.url ?? '/').split('?')[0];
  res.on('close', () => {
    log(`[uploads-fake] ${req.method} ${pathOnly} ${res.statusCode} ${Date.now() - started}ms`);
  });
}

export function requestOrigin(req: IncomingMessage): string {
  return `http://${req.headers.host ?? '127.0.0.1'}`;
}
