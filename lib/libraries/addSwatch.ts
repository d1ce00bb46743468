import 'server-only';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { getLiveColorant } from '@/db/queries/libraries';
import { samples, swatches } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { newId } from '@/lib/ids';
import { ApiError } from '@/lib/http/api';
import { measureZones } from '@/lib/matches/measureZones';
import type { SwatchInput } from '@/lib/validations/swatch';

// Measures a calibration swatch of one colorant and stores it: a sample (purpose "swatch")
// and the dose it was made with. The next suggestion refits the shop's model with it.
export async function addSwatch(database: DB, member: Member, colorantId: string, input: SwatchInput) {
  const teamId = member.team.id;
  const colorant = getLiveColorant(database, teamId, colorantId);
  if (!colorant) throw new ApiError(404, 'not_found', 'No such colorant in your library (or it was archived)');
  const unit = input.unit ?? colorant.unit;
  if (unit !== colorant.unit) throw new ApiError(400, 'invalid_body', `unit: ${colorant.name} is dosed in ${colorant.unit}; give the swatch's dose in ${colorant.unit}`);
  if (colorant.kind !== 'base' && !(input.amount > 0)) throw new ApiError(400, 'invalid_body', 'amount must be more than 0 for a colorant swatch (a swatch of the base alone is logged on a base colorant)');
  const measured = await measureZones(database, teamId, input.photoId, [{ name: 'swatch', shape: input.shape }], input.neutral);
  const r = measured.regions[0]!;
  const sampleId = newId();
  const id = newId();
  database.transaction((tx) => {
    tx.insert(samples)
      .values({
        id: sampleId, teamId, photoId: input.photoId, purpose: 'swatch', colorantId, zone: 'swatch', shape: input.shape, neutral: input.neutral ?? null,
        l: r.lab.l, a: r.lab.a, b: r.lab.b, hex: r.hex, pixels: r.pixels, kept: r.kept, spread: r.spread, glare: r.glare, flake: r.flake, whiteBalance: measured.whiteBalance,
      })
      .run();
    tx.insert(swatches).values({ id, teamId, colorantId, sampleId, amount: colorant.kind === 'base' ? 0 : input.amount, unit, notes: input.notes ?? null, createdBy: member.user.id }).run();
    recordAudit(tx, { teamId, actorId: member.user.id, action: 'swatch.created', entity: 'colorant', entityId: colorantId, data: { swatchId: id } });
  });
  return { id, colorantId, amount: colorant.kind === 'base' ? 0 : input.amount, unit, lab: r.lab, hex: r.hex, whiteBalance: measured.whiteBalance };
}
