import 'server-only';
import { NextResponse } from 'next/server';
import { z } from 'zod';

// The one error shape of the API: { error: { code, message } }.
export class ApiError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public headers: Record<string, string> = {},
  ) {
    super(message);
  }
}

export function errorResponse(status: number, code: string, message: string, headers: Record<string, string> = {}) {
  return NextResponse.json({ error: { code, message } }, { status, headers });
}

export const badRequest = (message: string, code = 'invalid_body') => new ApiError(400, code, message);
// Named apart from next/navigation's notFound(), which renders a page's 404.
export const notFoundError = (what = 'Not found') => new ApiError(404, 'not_found', what);
export const forbidden = (message = 'Your role may not do this') => new ApiError(403, 'forbidden', message);

type Ctx<P> = { params: Promise<P> };

// Wraps a route handler: ApiErrors become their JSON answer; anything else is
// logged and answered 500 in the same shape, never a stack trace.
export function withApi<P = Record<string, string>>(
  handler: (req: Request, ctx: Ctx<P>) => Promise<Response>,
) {
  return async (req: Request, ctx: Ctx<P>) => {
    try {
      return await handler(req, ctx);
    } catch (err) {
      if (err instanceof ApiError) return errorResponse(err.status, err.code, err.message, err.headers);
      console.error('[api] unexpected error', req.method, new URL(req.url).pathname, err);
      return errorResponse(500, 'internal', 'Something went wrong on the server; nothing was saved.');
    }
  };
}

export function describeZodError(error: z.ZodError): string {
  const first = error.issues[0];
  if (!first) return 'Invalid body';
  const where = first.path.reduce<string>(
    (acc, p) => (typeof p === 'number' ? `${acc}[${p}]` : acc ? `${acc}.${String(p)}` : String(p)),
    '',
  );
  return where ? `${where}: ${first.message}` : first.message;
}

// The same, for a value that sits under `field` (a form field holding JSON).
export function describeZodErrorAt(field: string, error: z.ZodError): string {
  const first = error.issues[0];
  if (!first || first.path.length === 0) return `${field}: ${first?.message ?? 'invalid'}`;
  const d = describeZodError(error);
  return d.startsWith('[') ? `${field}${d}` : `${field}.${d}`;
}

const MAX_JSON_BYTES = 256 * 1024;

// Reads and validates a JSON body: 400 for malformed JSON or a body that fails
// the schema, 413 for one over the size limit.
export async function readJson<T extends z.ZodType>(req: Request, schema: T): Promise<z.infer<T>> {
  const raw = await req.text();
  if (raw.length > MAX_JSON_BYTES) throw new ApiError(413, 'too_large', 'The request body is too large');
  let data: unknown;
  try {
    data = raw.length ? JSON.parse(raw) : undefined;
  } catch {
    throw badRequest('The body is not valid JSON', 'malformed_json');
  }
  const parsed = schema.safeParse(data);
  if (!parsed.success) throw badRequest(describeZodError(parsed.error));
  return parsed.data;
}

export function json(data: unknown, status = 200, headers?: Record<string, string>) {
  return NextResponse.json(data, { status, headers });
}
