import { isoDate, moneyAmount } from './fields';

const messages = (input: unknown) => {
  const result = isoDate.safeParse(input);
  return result.success ? [] : result.error.issues.map((i) => i.message);
};

describe('isoDate', () => {
  it.each(['2026-03-14', '2028-02-29', '1900-01-01', '2999-12-31'])('accepts %s', (day) => {
    expect(isoDate.parse(day)).toBe(day);
  });

  it.each([
    // PostgreSQL's calendar has no year 0 (1 BC is followed by AD 1): storing it failed with a 500.
    ['0000-01-01', 'Enter a date between 1900 and 2999.'],
    ['0026-05-01', 'Enter a date between 1900 and 2999.'],
    ['9999-12-31', 'Enter a date between 1900 and 2999.'],
    ['2026-02-30', 'That date does not exist.'],
    ['2027-02-29', 'That date does not exist.'],
    ['2026-13-01', 'That date does not exist.'],
    ['14/03/2026', 'Enter a date as YYYY-MM-DD.'],
    ['+02026-03-14', 'Enter a date as YYYY-MM-DD.'],
  ])('refuses %s with one message', (day, message) => {
    expect(messages(day)).toEqual([message]);
  });
});

describe('moneyAmount', () => {
  it.each([
    ['-5', 'The amount cannot be negative.'],
    ['-0.50', 'The amount cannot be negative.'],
    ['12.345', 'Enter an amount with at most two decimals, like 1250.00.'],
    ['twelve', 'Enter an amount with at most two decimals, like 1250.00.'],
  ])('refuses %s with one message that says why', (amount, message) => {
    const result = moneyAmount.safeParse(amount);
    expect(result.success ? [] : result.error.issues.map((i) => i.message)).toEqual([message]);
  });

  it('keeps a good amount as typed, trimmed', () => {
    expect(moneyAmount.parse(' 1250.50 ')).toBe('1250.50');
  });
});
