import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { toMoney } from '../errors/input-checks';
import { minorUnitDigits } from '../money/currency';
import { sumMoney, type MoneyInput } from '../money/money';
import { respreadSchedule } from './change-orders';

/** A priced extra the client may take with any option: its price before tax, its tax and its total. */
export interface AddOnPrice {
  readonly id: string;
  readonly price: MoneyInput;
  readonly tax: MoneyInput;
  readonly total: MoneyInput;
}

/** A payment of the option as the proposal shows it. */
export interface ShownPayment {
  readonly id: string;
  readonly role: 'deposit' | 'milestone' | 'final';
  readonly amount: MoneyInput;
  /** the percentage asked (null: a fixed amount or the rest) */
  readonly percent: number | null;
}

export interface AcceptedSum {
  /** the option's total and the chosen add-ons', tax included: the contract sum */
  readonly total: Decimal;
  readonly tax: Decimal;
  /** the option's payments, the add-ons spread over the later ones; same order and ids */
  readonly payments: ReadonlyArray<{ readonly id: string; readonly amount: Decimal; readonly percent: number | null }>;
}

/**
 * The contract an acceptance makes when the client takes add-ons with an option: the sum grows by the
 * add-ons' totals, and the schedule grows as an approved change order grows it (respreadSchedule):
 * the deposit stays as the client read it (a legal cap may hold it), the later payments take the
 * add-ons in proportion to their amounts, and the lines still add up to the sum to the cent. A line
 * whose amount moved no longer is the percentage it asked, so it keeps none. Without add-ons the
 * option is taken exactly as shown. Unknown or repeated ids are refused, naming `field`.
 */
export function acceptedSum(
  option: { readonly total: MoneyInput; readonly tax: MoneyInput; readonly payments: readonly ShownPayment[] },
  addOns: readonly AddOnPrice[],
  chosenIds: readonly string[],
  currency: string,
  field = 'addOnIds',
): AcceptedSum {
  const digits = minorUnitDigits(currency, 'currency');
  const byId = new Map(addOns.map((a) => [a.id, a]));
  const seen = new Set<string>();
  const chosen = chosenIds.map((id, i) => {
    const addOn = byId.get(id);
    if (!addOn) throw new DomainInputError(`${field}.${i}`, 'Choose add-ons from this proposal.');
    if (seen.has(id)) throw new DomainInputError(`${field}.${i}`, 'Each add-on can be chosen once.');
    seen.add(id);
    return addOn;
  });
  const base = toMoney(option.total, 'option.total', 'option total');
  const total = base.plus(sumMoney(chosen.map((a, i) => toMoney(a.total, `${field}.${i}`, 'add-on total'))));
  const tax = toMoney(option.tax, 'option.tax', 'option tax').plus(
    sumMoney(chosen.map((a, i) => toMoney(a.tax, `${field}.${i}`, 'add-on tax'))),
  );
  const shown = option.payments.map((p, i) => ({ p, amount: toMoney(p.amount, `option.payments.${i}.amount`, 'payment') }));
  if (!total.greaterThan(base)) {
    return { total, tax, payments: shown.map(({ p, amount }) => ({ id: p.id, amount, percent: p.percent })) };
  }
  // A plan that is all deposit (paid in full on signing) has no later payment to take them: the last line does.
  if (shown.every(({ p }) => p.role === 'deposit')) {
    const last = shown.length - 1;
    const added = total.minus(base);
    return {
      total,
      tax,
      payments: shown.map(({ p, amount }, i) =>
        i === last ? { id: p.id, amount: amount.plus(added), percent: null } : { id: p.id, amount, percent: p.percent },
      ),
    };
  }
  const spread = respreadSchedule(
    shown.map(({ p, amount }) => ({ id: p.id, label: '', role: p.role, trigger: { kind: 'acceptance' }, amount, isBilled: false })),
    total.toFixed(digits),
    currency,
  );
  return {
    total,
    tax,
    payments: spread.map((l, i) => ({ id: l.id, amount: l.amount, percent: l.amount.equals(shown[i].amount) ? shown[i].p.percent : null })),
  };
}
