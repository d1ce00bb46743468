import 'server-only';
import type { DoseUnit } from '@/db/schema';
import { ApiError } from '@/lib/http/api';
import { formatDose } from '@/lib/format';
import { convertDose } from '@/lib/recipes';

type Line = { zone: string; colorantId: string; amount: number; unit: DoseUnit };
type Colorant = { id: string; name: string; unit: DoseUnit };

// A colorant is dosed in its library unit, so history, hints and stock all
// count in one unit. A line written in another unit is converted where the
// conversion is exact (tsp ↔ mL; drops ↔ mL through the team's dropper
// setting) and refused otherwise (grams against a volume): never stored as
// typed under a unit the colorant does not use.
export function toLibraryUnits<L extends Line>(lines: L[], colorants: Map<string, Colorant>, dropsPerMl: number): L[] {
  return lines.map((line, i) => {
    const c = colorants.get(line.colorantId)!;
    if (line.unit === c.unit) return line;
    const amount = convertDose(line.amount, line.unit, c.unit, dropsPerMl);
    if (amount === null) {
      throw new ApiError(
        422,
        'unit_mismatch',
        `recipe[${i}].unit: ${c.name} is dosed in ${c.unit} in the library; ${formatDose(line.amount, line.unit)} cannot be converted to ${c.unit} without a density — give the dose in ${c.unit}`,
      );
    }
    return { ...line, amount, unit: c.unit };
  });
}
