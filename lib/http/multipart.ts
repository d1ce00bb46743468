import 'server-only';
import { ApiError, badRequest } from './api';

// Room for the multipart boundary, part headers and small text fields.
const FORM_SLACK = 64 * 1024;

// Reads a multipart body with a running count, so a body without (or lying
// about) its Content-Length is cut off at the limit instead of filling memory.
export async function readMultipart(req: Request, maxFileBytes: number, tooLargeMessage: string, usage: string): Promise<FormData> {
  const type = req.headers.get('content-type') ?? '';
  if (!/^multipart\/form-data;\s*boundary=/i.test(type)) throw badRequest(`Send multipart/form-data with ${usage}`, 'not_multipart');
  const max = maxFileBytes + FORM_SLACK;
  const tooLarge = () => new ApiError(413, 'too_large', tooLargeMessage);
  const declared = Number(req.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > max) throw tooLarge();
  // A declared length within the limit: Node's HTTP parser delivers no more than it, so the
  // body is parsed as it stands, without a running count or a copy of our own.
  if (req.headers.get('content-length') !== null && Number.isFinite(declared)) {
    try {
      return await req.formData();
    } catch {
      throw badRequest('The multipart body could not be read', 'malformed_multipart');
    }
  }
  const chunks: Uint8Array[] = [];
  if (req.body) {
    const reader = req.body.getReader();
    let total = 0;
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > max) {
        await reader.cancel().catch(() => undefined);
        throw tooLarge();
      }
      chunks.push(value);
    }
  }
  try {
    return await new Response(Buffer.concat(chunks), { headers: { 'content-type': type } }).formData();
  } catch {
    throw badRequest('The multipart body could not be read', 'malformed_multipart');
  }
}

// The uploaded file of a form field: 400 when missing or empty, 413 over the limit.
export async function formFile(form: FormData, field: string, maxBytes: number, tooLargeMessage: string): Promise<{ bytes: Buffer; name: string }> {
  const file = form.get(field);
  if (!file || typeof file === 'string') throw badRequest(`${field}: attach the photo as a file in the \`${field}\` field`);
  if (file.size > maxBytes) throw new ApiError(413, 'too_large', tooLargeMessage);
  if (file.size === 0) throw badRequest(`${field}: the file is empty (0 bytes)`, 'empty_file');
  return { bytes: Buffer.from(await file.arrayBuffer()), name: file.name };
}
