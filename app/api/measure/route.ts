import { z } from 'zod';
import { requireMember } from '@/lib/auth/current';
import { badRequest, describeZodErrorAt, json, withApi } from '@/lib/http/api';
import { imageApiError } from '@/lib/http/imageApiError';
import { formFile, readMultipart } from '@/lib/http/multipart';
import { assertSameOrigin } from '@/lib/http/origin';
import { measureOffThread } from '@/lib/image/measurePool';
import { withMeasureSlot } from '@/lib/http/measureSlots';
import { MAX_PHOTO_BYTES, TOO_LARGE_MESSAGE } from '@/lib/uploads/limits';
import { measureNeutralSchema, measureRegionsSchema } from '@/lib/validations/color';

export const dynamic = 'force-dynamic';

function jsonField<T extends z.ZodType>(form: FormData, field: string, schema: T, required: boolean): z.infer<T> | undefined {
  const raw = form.get(field);
  if (raw === null || raw === '') {
    if (required) throw badRequest(`${field}: required (JSON)`);
    return undefined;
  }
  if (typeof raw !== 'string' || raw.length > 64 * 1024) throw badRequest(`${field}: must be a JSON text field`);
  let data: unknown;
  try {
    data = JSON.parse(raw);
  } catch {
    throw badRequest(`${field}: not valid JSON`, 'malformed_json');
  }
  const parsed = schema.safeParse(data);
  if (!parsed.success) throw badRequest(describeZodErrorAt(field, parsed.error));
  return parsed.data;
}

// Measures regions of an uploaded photo without storing anything.
export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const member = await requireMember();
  const form = await readMultipart(req, MAX_PHOTO_BYTES, TOO_LARGE_MESSAGE, 'an `image` file and a `regions` JSON field');
  const regions = jsonField(form, 'regions', measureRegionsSchema, true)!;
  const neutral = jsonField(form, 'neutral', measureNeutralSchema, false);
  const { bytes } = await formFile(form, 'image', MAX_PHOTO_BYTES, TOO_LARGE_MESSAGE);
  try {
    return json(await withMeasureSlot(member.user.id, () => measureOffThread(bytes, regions, neutral)));
  } catch (err) {
    throw imageApiError(err);
  }
});
