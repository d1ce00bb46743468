import 'server-only';
import { ApiError } from '@/lib/http/api';

type Found = { name: string; archivedAt: number | null } | undefined;

// 409 when another entry of the team's library already carries the name
// (compared without case, so "Pigment, Reed Green" and "Pigment, reed green"
// cannot both sit in one recipe picker).
export function assertNameFree(what: 'colorant' | 'mold', name: string, found: Found) {
  if (!found) return;
  const shown = found.name.length > 80 ? `${found.name.slice(0, 80)}…` : found.name;
  const where = found.archivedAt === null ? '' : ' (archived: old recipes still show it under that name)';
  throw new ApiError(409, 'name_taken', `a ${what} named “${shown}” already exists${where}; choose another name`);
}

// The unique (team, name) index is the last word: if two writes race past
// the check above, the second one still answers 409, never 500.
// Drizzle wraps the driver's error in DrizzleQueryError, so look at the cause too.
export function isUniqueViolation(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && typeof e === 'object' && depth < 4; e = (e as { cause?: unknown }).cause, depth++) {
    if ((e as { code?: unknown }).code === 'SQLITE_CONSTRAINT_UNIQUE') return true;
  }
  return false;
}

export function nameTakenError(what: 'colorant' | 'mold', name: string) {
  return new ApiError(409, 'name_taken', `a ${what} named “${name}” already exists; choose another name`);
}
