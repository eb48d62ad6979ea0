import { jurisdictionLine } from '../safety/safety-cautions';

/** Target housing: built before 1978 (15 U.S.C. 2681(17)). */
export const TARGET_HOUSING_BEFORE = 1978;

/**
 * Where a home stands under the federal lead rules (40 CFR 745, subpart E):
 * - `target-housing`: built before 1978;
 * - `assumed-target-housing`: the year is not known and the work disturbs paint, so it is treated
 *   as built before 1978 until someone records the year (the cautious reading);
 * - `year-unknown`: not known, and nothing painted is disturbed;
 * - `built-1978-or-later`.
 */
export type LeadStatus = 'target-housing' | 'assumed-target-housing' | 'year-unknown' | 'built-1978-or-later';

export function leadStatus(yearBuilt: number | null | undefined, disturbsPaint: boolean): LeadStatus {
  if (yearBuilt === null || yearBuilt === undefined) return disturbsPaint ? 'assumed-target-housing' : 'year-unknown';
  return yearBuilt < TARGET_HOUSING_BEFORE ? 'target-housing' : 'built-1978-or-later';
}

export const isTreatedAsTargetHousing = (status: LeadStatus): boolean => status === 'target-housing' || status === 'assumed-target-housing';

/** The year the engine's lead rule works with: an unknown year with paint disturbed counts as before 1978. */
export function leadRuleYear(yearBuilt: number | null | undefined, disturbsPaint: boolean): number | undefined {
  if (yearBuilt !== null && yearBuilt !== undefined) return yearBuilt;
  return disturbsPaint ? TARGET_HOUSING_BEFORE - 1 : undefined;
}

/** The line that asks for the year, wherever an unknown year is being treated as before 1978. */
export const ASK_FOR_YEAR =
  'The year the building was built is not recorded. Until it is, the home is treated as built before 1978, because the work disturbs painted surfaces: enter the year on the site.';

export interface LeadNotice {
  readonly title: string;
  readonly bullets: readonly string[];
  readonly rule: string;
  /** whose rule it is (US federal) and, for a firm outside the US, to check its own rules */
  readonly jurisdiction: string;
}

/**
 * The lead-safe notice a proposal for a pre-1978 home carries (and one whose year is unknown while
 * paint is disturbed), in words for the client. Figures from 40 CFR 745.83 (minor repair: 6 ft² per
 * room, 20 ft² outside) and 745.84 (the "Renovate Right" pamphlet before work starts). Null otherwise.
 */
export function leadNotice(status: LeadStatus, firmCountry?: string): LeadNotice | null {
  if (!isTreatedAsTargetHousing(status)) return null;
  return {
    title: 'Lead-safe work in a home built before 1978',
    bullets: [
      status === 'target-housing'
        ? 'This home was built before 1978, so federal rules treat it as housing that may have lead-based paint.'
        : 'We do not know yet when this home was built. Because the work disturbs painted surfaces, we treat it as built before 1978 until we know: please tell us the year.',
      'Where the work disturbs more painted surface than a minor repair (more than 6 ft² in a room or 20 ft² outside), it is done by a certified firm with a certified renovator, using lead-safe practices.',
      'Before that work starts you receive the EPA pamphlet “Renovate Right”, and after it you receive the record of the lead-safe work.',
      'Some states and cities have stricter rules.',
    ],
    rule: '40 CFR 745 subpart E (EPA Renovation, Repair and Painting); target housing, 15 U.S.C. 2681(17)',
    jurisdiction: jurisdictionLine('lead-safe-work', firmCountry),
  };
}
