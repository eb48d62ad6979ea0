import type { SheetCaution } from '@layerbook/contracts';
import {
  CAUTION_WORDS,
  type CautionId,
  type CautionWordKey,
  OFFICE_ONLY_LINES,
  STANDING_LINE,
  cautionLineOf,
  crewLeadCaution,
  isTreatedAsTargetHousing,
  jurisdictionKeys,
  type JurisdictionKey,
  jurisdictionLine,
  type LeadStatus,
} from '@layerbook/domain';

/** The jurisdiction sentences of a stored line as written then (a firm may since have moved), else as for the firm today. */
function jurisdictionKeysOf(id: CautionId, stored: string | undefined, firmCountry: string): JurisdictionKey[] {
  const written = [jurisdictionKeys(id, 'US'), jurisdictionKeys(id, 'ZZ')].find(
    (keys) => keys.map((k) => CAUTION_WORDS[k]).join(' ') === stored,
  );
  return written ?? jurisdictionKeys(id, firmCountry);
}

/** A caution as a stored result holds it (older results lack the jurisdiction and the keys). */
export interface StoredCaution {
  readonly id: string;
  readonly title: string;
  readonly bullets: readonly string[];
  readonly rule: string;
  readonly jurisdiction?: string;
  readonly standing?: string;
}

/**
 * The cautions the engine raised for the accepted option, as the crew reads them: exactly the
 * stored ones, less the lines meant for the office (OFFICE_ONLY_LINES), each line with its key and
 * params read back from its English words — so a result stored before the engine sent keys, or one
 * whose lines the estimate added to (an unknown year), still translates line for line. Pure.
 */
export function sheetCautions(stored: readonly StoredCaution[], firmCountry: string): SheetCaution[] {
  return stored.map((c) => {
    const id = c.id as CautionId;
    const bullets = c.bullets.filter((b) => !OFFICE_ONLY_LINES.has(b));
    return {
      id,
      title: c.title,
      bullets,
      rule: c.rule,
      jurisdiction: c.jurisdiction ?? jurisdictionLine(id, firmCountry),
      standing: c.standing ?? STANDING_LINE,
      titleKey: `${id}.title` as CautionWordKey,
      ruleKey: `${id}.rule` as CautionWordKey,
      lines: bullets.map((b) => cautionLineOf(b) ?? { key: null, params: {} }),
      jurisdictionKeys: jurisdictionKeysOf(id, c.jurisdiction, firmCountry),
      standingKey: 'standing',
    };
  });
}

/**
 * The engine's cautions with the crew's lead reminder first where the home is treated as built
 * before 1978 (`lead`, the accepted option's) and the engine raised no lead-safe caution because the
 * planned work stays within minor repair: the proposal told the client about lead, and the crew are
 * the ones who disturb the paint. Pure.
 */
export function withCrewLead(
  stored: readonly StoredCaution[],
  lead: LeadStatus | undefined,
  firmCountry: string,
): readonly StoredCaution[] {
  if (lead === undefined || !isTreatedAsTargetHousing(lead) || stored.some((c) => c.id === 'lead-safe-work')) return stored;
  return [crewLeadCaution(lead === 'target-housing', firmCountry), ...stored];
}
