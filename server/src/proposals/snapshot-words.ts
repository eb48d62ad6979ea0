import type { ProposalSnapshot } from '@layerbook/contracts';
import { depositRuleText, type WordsReader } from '../billing/invoice-words';

/**
 * A proposal as one reader reads it: the words the system wrote into it (the ready-made deposit
 * rule's name) in their language. The stored snapshot and its hash are never changed; English
 * readers read it as stored.
 */
export function snapshotForReader(reader: WordsReader, s: ProposalSnapshot): ProposalSnapshot {
  if (reader.language === 'en' || !s.depositRule || !s.depositRuleId) return s;
  return { ...s, depositRule: depositRuleText(reader, s.depositRule, s.depositRuleId) };
}
