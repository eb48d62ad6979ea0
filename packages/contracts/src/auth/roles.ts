import { z } from 'zod';

/** Staff roles of a firm, from most to least trusted. Clients use the portal only. */
export const STAFF_ROLES = ['owner', 'office', 'crew'] as const;
export const staffRole = z.enum(STAFF_ROLES);
export type StaffRole = z.infer<typeof staffRole>;

/** owner ⊃ office ⊃ crew: a route that needs `office` admits owners too. */
export function roleAtLeast(actual: StaffRole, needed: StaffRole): boolean {
  return STAFF_ROLES.indexOf(actual) <= STAFF_ROLES.indexOf(needed);
}
