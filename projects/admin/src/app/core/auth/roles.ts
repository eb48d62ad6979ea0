import type { StaffRole } from '@layerbook/contracts';

/**
 * The contracts package builds its constants next to zod schemas, and importing any value from
 * it pulls all of zod (~450 kB) into the browser bundle. So the apps import only types from it
 * and keep the few values here, checked against those types in both directions.
 */
export const STAFF_ROLES = ['owner', 'office', 'crew'] as const satisfies readonly StaffRole[];

type MissingRole = Exclude<StaffRole, (typeof STAFF_ROLES)[number]>;
export const ALL_ROLES_LISTED: [MissingRole] extends [never] ? true : MissingRole = true;

/** owner ⊃ office ⊃ crew, as on the server: a page for `office` admits owners too. */
export function roleAtLeast(actual: StaffRole, needed: StaffRole): boolean {
  return STAFF_ROLES.indexOf(actual) <= STAFF_ROLES.indexOf(needed);
}
