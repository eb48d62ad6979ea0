import Decimal from 'decimal.js';
import fc from 'fast-check';
import { expectInputError } from '../errors/expect-input-error';
import { respreadSchedule } from './change-orders';
import { checkDeposit, depositCap } from './deposit-cap';
import { type PaymentLineInput, buildPaymentSchedule, paymentLabel } from './payment-schedule';

const acceptance = { kind: 'acceptance' } as const;
const thirds: PaymentLineInput[] = [
  { id: 'dep', label: 'Deposit', role: 'deposit', basis: { kind: 'share', share: '0.3333' }, trigger: acceptance },
  {
    id: 'base',
    label: 'Base coats complete',
    role: 'milestone',
    basis: { kind: 'share', share: '0.3333' },
    trigger: { kind: 'layerComplete', layerId: 'primer' },
  },
  { id: 'final', label: 'Final', role: 'final', basis: { kind: 'remainder' }, trigger: { kind: 'walkthrough' } },
];
const amounts = (lines: Array<{ amount: Decimal }>): string[] => lines.map((l) => l.amount.toFixed(2));

describe('payment labels say what makes each payment due (common practice, no source)', () => {
  it.each([
    ['deposit' as const, acceptance, undefined, 'Deposit on acceptance'],
    [
      'milestone' as const,
      { kind: 'layerComplete' as const, layerId: 'base' },
      'Base coat',
      'Progress payment when Base coat is finished on every surface',
    ],
    [
      'milestone' as const,
      { kind: 'layerComplete' as const, layerId: 'base' },
      '  ',
      'Progress payment when the chosen layer is finished on every surface',
    ],
    ['milestone' as const, { kind: 'date' as const, date: '2026-12-14' }, undefined, 'Progress payment due 2026-12-14'],
    ['final' as const, { kind: 'walkthrough' as const }, undefined, 'Final payment on completion, after the walkthrough'],
  ])('%s on %j (layer %j) is "%s"', (role, trigger, layerName, label) => expect(paymentLabel(role, trigger, layerName)).toBe(label));
});

describe('payment schedule (common practice, DOMAIN.md §2.11)', () => {
  it('thirds with the rest on the final payment', () => {
    expect(amounts(buildPaymentSchedule('10000.00', thirds, 'USD'))).toEqual(['3333.00', '3333.00', '3334.00']);
  });

  it('fixed deposit plus percentages of the contract', () => {
    const lines = buildPaymentSchedule(
      '12000.00',
      [
        { id: 'dep', label: 'Deposit', role: 'deposit', basis: { kind: 'amount', amount: '1000.00' }, trigger: acceptance },
        { id: 'm1', label: 'Plaster complete', role: 'milestone', basis: { kind: 'share', share: '0.5' }, trigger: acceptance },
        { id: 'fin', label: 'Final', role: 'final', basis: { kind: 'remainder' }, trigger: acceptance },
      ],
      'USD',
    );
    expect(amounts(lines)).toEqual(['1000.00', '6000.00', '5000.00']);
  });

  it('percentages that do not make 100 % are refused', () => {
    const bad: PaymentLineInput[] = thirds.slice(0, 2);
    expectInputError(() => buildPaymentSchedule('10000.00', bad, 'USD'), 'paymentSchedule', /66.66 %/);
    expectInputError(() => buildPaymentSchedule('10000.00', [], 'USD'), 'paymentSchedule', /empty/);
    expectInputError(() => buildPaymentSchedule('0', thirds, 'USD'), 'contractSum', /greater than zero/);
    expectInputError(
      () => buildPaymentSchedule('100.00', [{ ...thirds[0], basis: { kind: 'amount', amount: '150.00' } }, thirds[2]], 'USD'),
      'paymentSchedule',
      /more than the contract/,
    );
  });

  it('California deposit cap: lesser of $1,000 or 10 % — $12,000 job → $1,000', () => {
    // California Bus. & Prof. Code §7159 (down payment ≤ lesser of $1,000 or 10 %)
    const rule = { kind: 'lesserOf', amount: '1000.00', share: 0.1 } as const;
    expect(depositCap(rule, '12000.00', 'USD')?.toFixed(2)).toBe('1000.00');
    expect(depositCap(rule, '8000.00', 'USD')?.toFixed(2)).toBe('800.00');
    const check = checkDeposit('3600.00', rule, '12000.00', 'USD');
    expect(check.isWithinCap).toBe(false);
    expect(check.excess.toFixed(2)).toBe('2600.00');
    expect(depositCap({ kind: 'none' }, '12000.00', 'USD')).toBeNull();
    // 10 % of 12,345.67 = 1,234.567: the cap is 1,234.56 — 1,234.57 would be more than 10 %
    expect(depositCap(rule, '12345.67', 'USD')?.toFixed(2)).toBe('1000.00');
    expect(depositCap({ kind: 'share', share: 0.1 }, '12345.67', 'USD')?.toFixed(2)).toBe('1234.56');
    expect(depositCap(rule, '9999.99', 'USD')?.toFixed(2)).toBe('999.99');
  });

  it('a change order re-spreads unbilled lines pro rata and leaves billed lines alone', () => {
    const lines = buildPaymentSchedule('10000.00', thirds, 'USD');
    lines[0].isBilled = true;
    const after = respreadSchedule(lines, '13200.00', 'USD');
    // 13,200 − 3,333 billed = 9,867 split 3,333 : 3,334
    expect(amounts(after)).toEqual(['3333.00', '4932.76', '4934.24']);
    const deduct = respreadSchedule(lines, '9000.00', 'USD');
    // 9,000 − 3,333 = 5,667 split 3,333 : 3,334 = 2,833.0749… and 2,833.9250…; the larger remainder gets the cent
    expect(amounts(deduct)).toEqual(['3333.00', '2833.07', '2833.93']);
    expectInputError(() => respreadSchedule(lines, '3000.00', 'USD'), 'contractSum', /already been billed/);
  });

  it('a change order leaves a deposit not yet billed as it is (agreed at signing, held to its cap; common practice, no source)', () => {
    const lines = buildPaymentSchedule('10000.00', thirds, 'USD');
    const after = respreadSchedule(lines, '13200.00', 'USD');
    // 13,200 − the 3,333 deposit = 9,867 split 3,333 : 3,334 over the other two
    expect(amounts(after)).toEqual(['3333.00', '4932.76', '4934.24']);
    // a deduction lowers it with the rest, so it keeps within a share cap of the smaller contract:
    // 9,000 split 3,333 : 3,333 : 3,334 = 2,999.70 : 2,999.70 : 3,000.60 (largest remainder)
    expect(amounts(respreadSchedule(lines, '9000.00', 'USD'))).toEqual(['2999.70', '2999.70', '3000.60']);
  });

  it('lines always sum to the contract, never go negative, and billed lines never move (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 10_000, max: 100_000_000 }),
        fc.array(fc.integer({ min: 1, max: 100 }), { minLength: 1, maxLength: 6 }),
        fc.integer({ min: -50_000, max: 5_000_000 }),
        fc.integer({ min: 0, max: 6 }),
        (cents, weights, deltaCents, billedCount) => {
          const contract = new Decimal(cents).div(100);
          const wsum = weights.reduce((a, b) => a + b, 0);
          const input: PaymentLineInput[] = weights.map((w, i) => ({
            id: `p${i}`,
            label: `Payment ${i}`,
            role: 'milestone',
            basis: { kind: 'share', share: new Decimal(w).div(wsum) },
            trigger: acceptance,
          }));
          input.push({ id: 'rest', label: 'Final', role: 'final', basis: { kind: 'remainder' }, trigger: acceptance });
          const lines = buildPaymentSchedule(contract.toFixed(2), input, 'USD');
          const sum = (xs: typeof lines): Decimal => xs.reduce((a, l) => a.plus(l.amount), new Decimal(0));
          expect(sum(lines).equals(contract)).toBe(true);
          lines.forEach((l, i) => (l.isBilled = i < Math.min(billedCount, lines.length - 1)));
          const billed = sum(lines.filter((l) => l.isBilled));
          const next = contract.plus(new Decimal(deltaCents).div(100));
          if (next.lessThan(billed)) return;
          const after = respreadSchedule(lines, next.toFixed(2), 'USD');
          expect(sum(after).equals(next)).toBe(true);
          after.forEach((l, i) => {
            expect(l.amount.isNegative()).toBe(false);
            expect(l.amount.lessThanOrEqualTo(next)).toBe(true);
            if (l.isBilled) expect(l.amount.equals(lines[i].amount)).toBe(true);
          });
        },
      ),
    );
  });
});
