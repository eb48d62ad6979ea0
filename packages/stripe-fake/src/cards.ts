import type { CardUsed } from './objects/payment';

/** How a test card answers: accepted, or declined with Stripe's decline code and message. */
export interface TestCard {
  number: string;
  brand: string;
  funding: string;
  country: string;
  decline: { code: string; declineCode: string; message: string } | null;
}

const declined = (declineCode: string, message: string, code = 'card_declined') => ({ code, declineCode, message });

/**
 * Stripe's published test card numbers (Stripe Docs "Testing" — test card numbers and declined
 * payments); the messages are the ones Stripe shows for each decline code.
 */
export const TEST_CARDS: readonly TestCard[] = [
  { number: '4242424242424242', brand: 'visa', funding: 'credit', country: 'US', decline: null },
  { number: '4000056655665556', brand: 'visa', funding: 'debit', country: 'US', decline: null },
  { number: '5555555555554444', brand: 'mastercard', funding: 'credit', country: 'US', decline: null },
  {
    number: '4000000000000002',
    brand: 'visa',
    funding: 'credit',
    country: 'US',
    decline: declined('generic_decline', 'Your card was declined.'),
  },
  {
    number: '4000000000009995',
    brand: 'visa',
    funding: 'credit',
    country: 'US',
    decline: declined('insufficient_funds', 'Your card has insufficient funds.'),
  },
  {
    number: '4000000000009987',
    brand: 'visa',
    funding: 'credit',
    country: 'US',
    decline: declined('lost_card', 'Your card was declined.'),
  },
  {
    number: '4000000000000069',
    brand: 'visa',
    funding: 'credit',
    country: 'US',
    decline: declined('expired_card', 'Your card has expired.', 'expired_card'),
  },
  {
    number: '4000000000000127',
    brand: 'visa',
    funding: 'credit',
    country: 'US',
    decline: declined('incorrect_cvc', "Your card's security code is incorrect.", 'incorrect_cvc'),
  },
];

/** The card details a payment is made with (the hosted page's fields, or a test control's). */
export interface CardEntry {
  number: string;
  expMonth: number;
  expYear: number;
  cvc: string;
}

export type CardOutcome = { ok: true; card: CardUsed; test: TestCard } | { ok: false; field: 'number' | 'expiry' | 'cvc'; message: string };

const luhn = (digits: string) =>
  [...digits].reverse().reduce((sum, ch, i) => {
    const d = Number(ch) * (i % 2 ? 2 : 1);
    return sum + (d > 9 ? d - 9 : d);
  }, 0) %
    10 ===
  0;

/** Checks the entry as Stripe's card form does, and finds the test card it names. */
export function readCard(entry: CardEntry, now: Date): CardOutcome {
  const number = entry.number.replace(/[\s-]/g, '');
  if (!/^\d{12,19}$/.test(number)) return { ok: false, field: 'number', message: 'Your card number is incomplete.' };
  if (!luhn(number)) return { ok: false, field: 'number', message: 'Your card number is invalid.' };
  if (!Number.isInteger(entry.expMonth) || entry.expMonth < 1 || entry.expMonth > 12) {
    return { ok: false, field: 'expiry', message: "Your card's expiration date is incomplete." };
  }
  const year = entry.expYear < 100 ? 2000 + entry.expYear : entry.expYear;
  const thisYear = now.getUTCFullYear();
  if (year < thisYear || (year === thisYear && entry.expMonth < now.getUTCMonth() + 1)) {
    return { ok: false, field: 'expiry', message: "Your card's expiration year is in the past." };
  }
  if (!/^\d{3,4}$/.test(entry.cvc)) return { ok: false, field: 'cvc', message: "Your card's security code is incomplete." };
  const test: TestCard = TEST_CARDS.find((c) => c.number === number) ?? {
    number,
    brand: number.startsWith('5') ? 'mastercard' : 'visa',
    funding: 'credit',
    country: 'US',
    decline: declined('test_mode_live_card', 'Your card was declined. Your request was in test mode, but used a non test card.'),
  };
  return {
    ok: true,
    test,
    card: {
      brand: test.brand,
      last4: number.slice(-4),
      expMonth: entry.expMonth,
      expYear: year,
      funding: test.funding,
      country: test.country,
    },
  };
}
