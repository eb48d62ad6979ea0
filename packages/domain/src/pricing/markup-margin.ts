import Decimal from 'decimal.js';
import { DomainInputError } from '../errors/domain-input-error';
import { type Ratio, toRatio } from './ratio';

/** margin = markup / (1 + markup): a 25 % markup on cost is a 20 % share of the price. */
export function marginFromMarkup(markup: Ratio, field = 'markup'): Decimal {
  const m = toRatio(markup, field, 'markup', Number.MAX_SAFE_INTEGER);
  return m.div(m.plus(1));
}

/** markup = margin / (1 − margin); a margin of 100 % or more has no markup. */
export function markupFromMargin(margin: Ratio, field = 'margin'): Decimal {
  const m = toRatio(margin, field, 'margin');
  if (m.greaterThanOrEqualTo(1)) throw new DomainInputError(field, 'A margin must be below 100 %.');
  return m.div(new Decimal(1).minus(m));
}
