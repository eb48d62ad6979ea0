import type { ProposalTerms, SnapshotPayment } from '@layerbook/contracts';
import {
  buildPaymentSchedule,
  checkDeposit,
  DomainInputError,
  paymentLabel,
  type DepositCapRule,
  type PaymentLineInput,
} from '@layerbook/domain';
import Decimal from 'decimal.js';

export interface ScheduleFacts {
  readonly finishDate: string;
  /** layer milestones in time order, as the engine dated them (the job's own milestone excluded) */
  readonly layerMilestones: ReadonlyArray<{ layerId: string; label: string; date: string }>;
}

/**
 * The payment lines of one option: deposit on acceptance, a progress payment when about half the
 * layers are on (the middle layer finished on every surface, never the last), the rest on
 * completion. Tying progress to the middle of the stack rather than the first coat keeps payments
 * from running ahead of the work done (DOMAIN.md §1.4; California B&P §7159 forbids it for home
 * improvement). Amounts come from the domain and add up to `total` exactly. A deposit over the cap
 * becomes the cap, and the rest moves to the final payment.
 */
export function optionPayments(
  total: string,
  currency: string,
  digits: number,
  terms: ProposalTerms,
  facts: ScheduleFacts,
  capRule: DepositCapRule,
) {
  const n = facts.layerMilestones.length;
  const base = n > 1 ? facts.layerMilestones[Math.floor((n - 1) / 2)] : null;
  const share = (p: number) => new Decimal(p).div(100);
  const lines: Array<PaymentLineInput & { percent: number | null; expectedOn: string | null }> = [];
  if (terms.depositPercent > 0) {
    lines.push({
      id: 'deposit',
      label: paymentLabel('deposit', { kind: 'acceptance' }),
      role: 'deposit',
      basis: { kind: 'share', share: share(terms.depositPercent) },
      trigger: { kind: 'acceptance' },
      percent: terms.depositPercent,
      expectedOn: null,
    });
  }
  if (base && terms.progressPercent > 0) {
    lines.push({
      id: 'progress',
      label: paymentLabel('milestone', { kind: 'layerComplete', layerId: base.layerId }, base.label),
      role: 'milestone',
      basis: { kind: 'share', share: share(terms.progressPercent) },
      trigger: { kind: 'layerComplete', layerId: base.layerId },
      percent: terms.progressPercent,
      expectedOn: base.date,
    });
  }
  lines.push({
    id: 'final',
    label: paymentLabel('final', { kind: 'walkthrough' }),
    role: 'final',
    basis: { kind: 'remainder' },
    trigger: { kind: 'walkthrough' },
    percent: null,
    expectedOn: facts.finishDate,
  });

  let isDepositCapped = false;
  let built = buildPaymentSchedule(total, lines, currency, 'terms');
  const deposit = built.find((l) => l.role === 'deposit');
  if (deposit) {
    const check = checkDeposit(deposit.amount, capRule, total, currency);
    if (!check.isWithinCap && check.cap) {
      isDepositCapped = true;
      const at = lines.findIndex((l) => l.role === 'deposit');
      lines[at] = { ...lines[at], basis: { kind: 'amount', amount: check.cap.toFixed(digits) }, percent: null };
      built = buildPaymentSchedule(total, lines, currency, 'terms');
    }
  }
  // A final payment of nothing could never be billed (no invoice is drafted for 0.00) and leaves no
  // money for after the walkthrough: the deposit and the progress payment must leave some.
  if (built.find((l) => l.role === 'final')?.amount.isZero()) {
    throw new DomainInputError(
      'terms.progressPercent',
      'Leave something for the final payment: the deposit and the progress payment together must be under 100 %.',
    );
  }
  const payments: SnapshotPayment[] = built.map((l, i) => ({
    id: l.id,
    label: l.label,
    role: l.role,
    trigger:
      l.trigger.kind === 'layerComplete'
        ? { kind: 'layerComplete', layerId: l.trigger.layerId }
        : l.trigger.kind === 'acceptance'
          ? { kind: 'acceptance' }
          : { kind: 'walkthrough' },
    percent: lines[i].percent,
    amount: l.amount.toFixed(digits),
    expectedOn: lines[i].expectedOn,
  }));
  return { payments, isDepositCapped };
}
