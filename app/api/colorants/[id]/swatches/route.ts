import { db } from '@/db';
import { requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { withMeasureSlot } from '@/lib/http/measureSlots';
import { assertSameOrigin } from '@/lib/http/origin';
import { addSwatch } from '@/lib/libraries/addSwatch';
import { swatchSchema } from '@/lib/validations/swatch';

// Calibrates a colorant: a swatch of a known dose per cup in the base, measured on a photo.
export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const { id } = await params;
  const input = await readJson(req, swatchSchema);
  return json(await withMeasureSlot(member.user.id, () => addSwatch(db(), member, id, input)), 201);
});
