import { inject } from 'vitest';

export function baseUrl(): string {
  const url = inject('baseUrl');
  if (!url) throw new Error('No app server: run `npm test`, which builds the app before the suite');
  return url;
}

export type ApiAnswer<T = any> = { status: number; body: T; headers: Headers; cookie: string | null };

// Calls the running app like an outside caller would: JSON body, the app's
// Origin, and an optional session cookie.
export async function api<T = any>(
  pathname: string,
  opts: { method?: string; body?: unknown; raw?: string; cookie?: string | null; origin?: string | null; headers?: Record<string, string> } = {},
): Promise<ApiAnswer<T>> {
  const headers: Record<string, string> = { ...(opts.headers ?? {}) };
  if (opts.body !== undefined || opts.raw !== undefined) headers['content-type'] = 'application/json';
  if (opts.origin !== null) headers.origin = opts.origin ?? baseUrl();
  if (opts.cookie) headers.cookie = opts.cookie;
  const res = await fetch(baseUrl() + pathname, {
    method: opts.method ?? (opts.body !== undefined || opts.raw !== undefined ? 'POST' : 'GET'),
    headers,
    body: opts.raw ?? (opts.body !== undefined ? JSON.stringify(opts.body) : undefined),
    redirect: 'manual',
  });
  const text = await res.text();
  let body: any = text;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    /* not JSON */
  }
  const setCookie = res.headers.get('set-cookie');
  const cookie = setCookie ? setCookie.split(';')[0]! : null;
  return { status: res.status, body, headers: res.headers, cookie };
}

let counter = 0;
export function uniqueEmail(prefix = 'user'): string {
  counter += 1;
  return `${prefix}-${Date.now().toString(36)}-${process.pid}-${counter}@example.test`;
}

export async function signUpShop(name = 'Test shop') {
  const email = uniqueEmail('owner');
  const password = 'correct horse battery';
  const res = await api('/api/auth/sign-up', { body: { email, password, name: 'Test Owner', teamName: name } });
  if (res.status !== 201 || !res.cookie) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { email, password, cookie: res.cookie, body: res.body };
}

export async function signInAs(email: string, password = 'pourproof-demo', ip?: string) {
  const res = await api('/api/auth/sign-in', { body: { email, password }, headers: ip ? { 'x-forwarded-for': ip } : {} });
  if (res.status !== 200 || !res.cookie) throw new Error(`sign-in failed for ${email}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.cookie;
}

export function expectErrorShape(body: any): asserts body is { error: { code: string; message: string } } {
  if (!body || typeof body !== 'object' || !body.error || typeof body.error.code !== 'string' || typeof body.error.message !== 'string') {
    throw new Error(`not the error shape: ${JSON.stringify(body)}`);
  }
}
