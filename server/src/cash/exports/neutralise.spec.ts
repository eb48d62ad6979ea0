import { neutralise } from './neutralise';

describe('neutralise (spreadsheet-safe free text)', () => {
  // OWASP "CSV Injection": cells starting with = + - @ tab or carriage return get a single quote in front
  it.each([
    ['=HYPERLINK("http://x.test","click")', `'=HYPERLINK("http://x.test","click")`],
    ['+1 555 0100', `'+1 555 0100`],
    ['-2+3', `'-2+3`],
    ['@SUM(A1:A2)', `'@SUM(A1:A2)`],
    ['\t=1+1', `'\t=1+1`],
    ['\r=1+1', `'\r=1+1`],
    // OWASP ASVS 5.0 1.2.10: the null character too
    ['\0=1', `'\0=1`],
  ])('%j → %j', (input, expected) => {
    expect(neutralise(input)).toBe(expected);
  });

  it.each(['Edwina Marl', 'Cheque 1042', "'already text", '', ' =not first', 'a=b'])('%j stays as it is', (input) => {
    expect(neutralise(input)).toBe(input);
  });
});
