import 'server-only';
import type { Role } from '@/db/schema';

const RANK: Record<Role, number> = { viewer: 0, maker: 1, lead: 2, owner: 3 };

// Roles are ordered: an owner can do everything a lead can, a lead everything
// a maker can, a maker everything a viewer can.
export function roleAtLeast(role: Role, needed: Role): boolean {
  return RANK[role] >= RANK[needed];
}
