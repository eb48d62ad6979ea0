import { neutralise } from './neutralise';

/**
 * Reference: OWASP "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection) — cells starting
 * with = + - @, tab or carriage return get a single quote in front; OWASP ASVS 5.0 1.2.10 adds the
 * null character. Whitespace before them and their full-width forms count too.
 */
describe('neutralise (spreadsheet-safe free text)', () => {
  it.each([
    ['=HYPERLINK("http://x.test","click")', `'=HYPERLINK("http://x.test","click")`],
    ['+1 555 0100', `'+1 555 0100`],
    ['-2+3', `'-2+3`],
    ['@SUM(A1:A2)', `'@SUM(A1:A2)`],
    ['\t=1+1', `'\t=1+1`],
    ['\r=1+1', `'\r=1+1`],
    ['\0=1', `'\0=1`],
    // the first character after leading spaces, tabs, CR/LF
    [' =not first', `' =not first`],
    ['   +1 555 0100', `'   +1 555 0100`],
    ['\n\n@SUM(A1:A2)', `'\n\n@SUM(A1:A2)`],
    ['\r\n-2+3', `'\r\n-2+3`],
    [' \t =1+1', `' \t =1+1`],
    // full-width = + - @
    ['＝1+1', `'＝1+1`],
    ['＋1 555 0100', `'＋1 555 0100`],
    ['－2+3', `'－2+3`],
    ['＠SUM(A1:A2)', `'＠SUM(A1:A2)`],
    ['  ＝HYPERLINK("http://x.test")', `'  ＝HYPERLINK("http://x.test")`],
  ])('%j → %j', (input, expected) => {
    expect(neutralise(input)).toBe(expected);
  });

  it.each(['Edwina Marl', 'Cheque 1042', "'already text", '', 'a=b', '  Orla Ochre', 'A-1 Plaster', 'x ＝ y'])(
    '%j stays as it is',
    (input) => {
      expect(neutralise(input)).toBe(input);
    },
  );

  // A plain decimal is a number to a spreadsheet, not a formula: amounts are written that way ("-12.50",
  // money-movements.ts and clients.ts never pass them here) and a typed one stays a number too.
  it.each(['-12.50', '-3', '42', '0.50'])('plain number %j stays a number', (input) => {
    expect(neutralise(input)).toBe(input);
  });

  it.each([
    ['-12.50 refund', `'-12.50 refund`],
    [' -12.50', `' -12.50`],
    ['-12.5e3', `'-12.5e3`],
    ['--12.50', `'--12.50`],
  ])('%j is more than a plain number → %j', (input, expected) => {
    expect(neutralise(input)).toBe(expected);
  });
});
