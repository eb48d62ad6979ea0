import type { ProposalSnapshot, SnapshotOption } from '@layerbook/contracts';
import { depositRuleText, scheduleLineWords, systemText, type WordsReader } from '../billing/invoice-words';

/** The job's own milestone, as the engine's schedule names it ('job'). */
const JOB_MILESTONE = { id: 'job', words: { key: 'invoiceWords.jobComplete' } } as const;

/** One option's payment labels and job milestone in the reader's words (paymentLabel's, by role and trigger). */
function optionForReader(reader: WordsReader, o: SnapshotOption): SnapshotOption {
  return {
    ...o,
    payments: o.payments.map((p) => ({ ...p, label: systemText(reader, p.label, scheduleLineWords(p.label, p.role, p.trigger)) })),
    schedule: {
      ...o.schedule,
      milestones: o.schedule.milestones.map((m) =>
        m.id === JOB_MILESTONE.id ? { ...m, label: systemText(reader, m.label, JOB_MILESTONE.words) } : m,
      ),
    },
  };
}

/**
 * A proposal as one reader reads it: the words the system wrote into it (the ready-made deposit
 * rule's name, the payment labels, the job's milestone) in their language; a layer's name stays as
 * the firm wrote it. The stored snapshot and its hash are never changed; English readers read it as stored.
 */
export function snapshotForReader(reader: WordsReader, s: ProposalSnapshot): ProposalSnapshot {
  if (reader.language === 'en') return s;
  return {
    ...s,
    ...(s.depositRule && s.depositRuleId ? { depositRule: depositRuleText(reader, s.depositRule, s.depositRuleId) } : {}),
    options: s.options.map((o) => optionForReader(reader, o)),
  };
}
