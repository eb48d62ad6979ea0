import type { SnapshotCaution } from '@layerbook/contracts/types';

/**
 * The small print under a caution or the lead-safe notice: the rule it points to, then whose rule
 * it is ("A US federal rule.", and outside the US a line to check the firm's own rules). A snapshot
 * made before cautions said whose rule it is has only the rule; empty lines are left out.
 */
export function cautionFootnotes(caution: Pick<SnapshotCaution, 'rule' | 'jurisdiction'>): string[] {
  return [caution.rule, caution.jurisdiction ?? ''].map((line) => line.trim()).filter((line) => line !== '');
}
