export type ZoneCups = { zone: string; cups: number };

// Each zone of a laminate is mixed in its own cup (common practice), so a
// batch records the cups of each zone. Without a split given, the batch is
// split evenly between the zones. A given split must name every zone once and
// add up to the batch (to 1/1000 cup, the rounding of a typed figure).
export function splitZoneCups(totalCups: number, zones: string[], given?: ZoneCups[] | null): ZoneCups[] {
  if (!(totalCups > 0)) throw new RangeError('batch size must be more than 0 cups');
  if (zones.length === 0) return [];
  if (!given || given.length === 0) return zones.map((zone) => ({ zone, cups: totalCups / zones.length }));
  const problem = zoneCupsProblem(totalCups, zones, given);
  if (problem) throw new RangeError(problem);
  return zones.map((zone) => ({ zone, cups: given.find((g) => g.zone === zone)!.cups }));
}

/** Why a split does not fit the batch, or null when it does. */
export function zoneCupsProblem(totalCups: number, zones: string[], given: ZoneCups[]): string | null {
  const names = given.map((g) => g.zone);
  const unknown = names.filter((n) => !zones.includes(n));
  if (unknown.length) return `zoneCups: "${unknown[0]}" is not a zone of the standard (zones: ${zones.join(', ')})`;
  if (new Set(names).size !== names.length) return 'zoneCups: each zone may be given once';
  const missing = zones.filter((z) => !names.includes(z));
  if (missing.length) return `zoneCups: give the cups of every zone (missing: ${missing.join(', ')})`;
  if (given.some((g) => !(g.cups > 0))) return 'zoneCups: each zone needs more than 0 cups';
  const sum = given.reduce((s, g) => s + g.cups, 0);
  if (Math.abs(sum - totalCups) > 0.001) return `zoneCups: the zones add up to ${Number(sum.toFixed(3))} cups, not the batch's ${Number(totalCups.toFixed(3))}`;
  return null;
}
