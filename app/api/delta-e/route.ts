import { requireMember } from '@/lib/auth/current';
import { compareLab } from '@/lib/color';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { deltaESchema } from '@/lib/validations/color';

// CIEDE2000 (kL = kC = kH = 1) with ΔL*, ΔC*ab, ΔH*ab (ASTM D2244 signs).
export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  await requireMember();
  const { reference, sample, tolerance } = await readJson(req, deltaESchema);
  return json(compareLab(reference, sample, tolerance));
});
