import 'server-only';
import { and, eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { photos } from '@/db/schema';
import { compareLab, type Lab, type RegionMeasure, type Shape } from '@/lib/color';
import { ApiError } from '@/lib/http/api';
import { imageApiError } from '@/lib/http/imageApiError';
import type { NeutralPatch, PhotoMeasure } from '@/lib/image';
import { measureOffThread } from '@/lib/image/measurePool';
import { fetchStoredBytes } from '@/lib/uploads/service';

export interface ZoneToMeasure {
  name: string;
  shape: Shape;
  /** The same zone of a physical reference lying in the same photo. */
  reference?: Shape;
}

export type MeasuredZones = PhotoMeasure & { references: Record<string, RegionMeasure> };

// Reference regions ride along under names no zone can have (zone names are [a-z0-9 _-]).
const REF = '\u0001ref:';

// Measures named zones (and their in-frame references) on one of the team's stored photos, in one
// decode. A photo of another team answers 404 like a missing one; a photo that cannot be measured
// answers the image error's status with its message.
export async function measureZones(database: DB, teamId: string, photoId: string, zones: ZoneToMeasure[], neutral?: NeutralPatch): Promise<MeasuredZones> {
  const photo = database.select().from(photos).where(and(eq(photos.id, photoId), eq(photos.teamId, teamId))).get();
  if (!photo) throw new ApiError(404, 'not_found', 'photoId: no such photo in your team');
  const bytes = await fetchStoredBytes(photo.fileKey);
  const regions = [
    ...zones.map((z) => ({ name: z.name, shape: z.shape })),
    ...zones.filter((z) => z.reference).map((z) => ({ name: REF + z.name, shape: z.reference! })),
  ];
  let measured: PhotoMeasure;
  try {
    measured = await measureOffThread(bytes, regions, neutral);
  } catch (err) {
    throw imageApiError(err, (m) => m.replace(REF, 'the reference of '));
  }
  const references: Record<string, RegionMeasure> = {};
  for (const r of measured.regions) if (r.name.startsWith(REF)) references[r.name.slice(REF.length)] = r;
  return { ...measured, regions: measured.regions.filter((r) => !r.name.startsWith(REF)), references };
}

/**
 * The columns a compared sample (pour or batch zone) stores beyond its colour: its own ± and
 * the ± of its dE00 (the two measurements' uncertainties combined in quadrature, JCGM 100:2008
 * §5.1.2: independent photos), its shading and second colour, and the comparison with a reference
 * in the same frame (same light, so no card is needed).
 */
export function comparedExtras(region: RegionMeasure, againstUncertainty: number | null, reference: RegionMeasure | undefined, referenceShape: Shape | undefined, tolerance: number) {
  let inFrame: (ReturnType<typeof compareLab> & { lab: Lab; uncertainty: number }) | null = null;
  if (reference) {
    const { withinTolerance, ...cmp } = compareLab(reference.lab, region.lab, tolerance);
    inFrame = { lab: reference.lab, ...cmp, withinTolerance, uncertainty: Math.hypot(reference.uncertainty, region.uncertainty) };
  }
  return {
    uncertainty: region.uncertainty,
    dE00Uncertainty: Math.hypot(region.uncertainty, againstUncertainty ?? 0),
    shading: region.shading,
    other: region.other,
    referenceShape: referenceShape ?? null,
    inFrame,
  };
}
