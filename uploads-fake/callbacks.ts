import type { ServerResponse } from 'node:http';
import { signPayload } from './signing';

// What the app's route handler registers at `POST /route-metadata` before the
// browser uploads (uploadthing 7.7.4, dist/upload-builder: `handleUploadAction`).
export type RouteRegistration = {
  metadata: unknown;
  isDev: boolean;
  callbackUrl: string;
  callbackSlug: string;
  awaitServerData: boolean;
  devStream?: DevStream;
};

export type CallbackResult = { callbackData: unknown } | { error: string };

type Deferred<T> = { promise: Promise<T>; resolve: (v: T) => void };

function deferred<T>(): Deferred<T> {
  let resolve!: (v: T) => void;
  const promise = new Promise<T>((r) => (resolve = r));
  return { promise, resolve };
}

function withTimeout<T>(promise: Promise<T>, ms: number, fallback: T): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<T>((r) => (timer = setTimeout(() => r(fallback), ms)));
  return Promise.race([promise, timeout]).finally(() => clearTimeout(timer));
}

// In dev mode the route handler keeps the `/route-metadata` response open and
// reads it as JSON lines `{ payload, signature, hook }`, forwarding each to
// itself (`handleJsonLineStream` + `MetadataFetchStreamPart`), because the
// hosted service cannot reach a developer's machine.
export class DevStream {
  private readonly remaining: Set<string>;
  private readonly timer: NodeJS.Timeout;

  constructor(
    private readonly res: ServerResponse,
    fileKeys: string[],
    timeoutMs: number,
    private readonly onEnd: () => void,
  ) {
    this.remaining = new Set(fileKeys);
    res.writeHead(200, { 'content-type': 'application/x-ndjson', 'cache-control': 'no-store' });
    res.flushHeaders();
    this.timer = setTimeout(() => this.end(), timeoutMs);
    res.on('close', () => this.end());
  }

  send(key: string, payload: string, signature: string): void {
    if (this.res.writableEnded) return;
    this.res.write(`${JSON.stringify({ payload, signature, hook: 'callback' })}\n`);
    this.remaining.delete(key);
    if (this.remaining.size === 0) this.end();
  }

  end(): void {
    clearTimeout(this.timer);
    if (!this.res.writableEnded) this.res.end();
    this.onEnd();
  }
}

export class CallbackHub {
  private readonly routes = new Map<string, RouteRegistration>();
  private readonly routeWaiters = new Map<string, Deferred<RouteRegistration>>();
  private readonly results = new Map<string, Deferred<CallbackResult>>();
  private readonly streams = new Set<DevStream>();

  constructor(private readonly apiKey: string) {}

  openDevStream(res: ServerResponse, fileKeys: string[], timeoutMs: number): DevStream {
    const stream: DevStream = new DevStream(res, fileKeys, timeoutMs, () => this.streams.delete(stream));
    this.streams.add(stream);
    return stream;
  }

  register(fileKeys: string[], registration: RouteRegistration): void {
    for (const key of fileKeys) {
      this.routes.set(key, registration);
      this.routeWaiters.get(key)?.resolve(registration);
      this.routeWaiters.delete(key);
    }
  }

  // In dev mode the handler registers in the background after answering the
  // browser, so an upload may arrive first; wait a little for its registration.
  waitForRoute(key: string, ms: number): Promise<RouteRegistration | null> {
    const known = this.routes.get(key);
    if (known) return Promise.resolve(known);
    const waiter = this.routeWaiters.get(key) ?? deferred<RouteRegistration>();
    this.routeWaiters.set(key, waiter);
    return withTimeout<RouteRegistration | null>(waiter.promise, ms, null);
  }

  private result(key: string): Deferred<CallbackResult> {
    const existing = this.results.get(key);
    if (existing) return existing;
    const created = deferred<CallbackResult>();
    this.results.set(key, created);
    return created;
  }

  // Called from `POST /callback-result`, sent by the route handler once
  // `onUploadComplete` has returned (`handleCallbackRequest`).
  settle(key: string, result: CallbackResult): void {
    this.result(key).resolve(result);
  }

  // Sends the signed `callback` hook for a stored file, the same body the
  // handler validates: { status, file: UploadedFileData, origin, metadata }.
  async deliver(key: string, reg: RouteRegistration, file: Record<string, unknown>, origin: string): Promise<void> {
    const payload = JSON.stringify({ status: 'uploaded', file, origin, metadata: reg.metadata });
    const signature = signPayload(payload, this.apiKey);
    if (reg.devStream) {
      reg.devStream.send(key, payload, signature);
      return;
    }
    const target = new URL(reg.callbackUrl);
    target.searchParams.set('slug', reg.callbackSlug);
    const res = await fetch(target, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'uploadthing-hook': 'callback', 'x-uploadthing-signature': signature },
      body: payload,
    });
    if (!res.ok) throw new Error(`App callback answered ${res.status}: ${(await res.text()).slice(0, 200)}`);
  }

  async awaitResult(key: string, ms: number): Promise<CallbackResult> {
    const outcome = await withTimeout<CallbackResult>(this.result(key).promise, ms, {
      error: `The app did not report onUploadComplete's result within ${ms} ms`,
    });
    this.forget(key);
    return outcome;
  }

  forget(key: string): void {
    this.results.delete(key);
    this.routes.delete(key);
  }

  closeAll(): void {
    for (const stream of this.streams) stream.end();
    this.streams.clear();
  }
}
