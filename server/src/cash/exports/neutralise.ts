/**
 * When a spreadsheet reads a cell as a formula (OWASP "CSV Injection"): it starts with = + - @, tab
 * (0x09) or carriage return (0x0D), and OWASP ASVS 5.0 1.2.10 adds the null character (0x00). Leading
 * whitespace does not stop it (spreadsheets trim " =1+1" on import and run it), and the full-width
 * ＝ ＋ － ＠ (U+FF1D, U+FF0B, U+FF0D, U+FF20) are read as their ASCII forms by some (Excel in East
 * Asian locales), so the first character after any whitespace counts too.
 */
const FORMULA_START = /^(?:[\t\r\0]|\s*[=+\-@\uFF1D\uFF0B\uFF0D\uFF20])/;

/**
 * A plain decimal ("-12.50", "42"): a spreadsheet reads it as a number, never a formula, so it keeps
 * its sign rather than turning into text that no longer adds up.
 */
const PLAIN_NUMBER = /^-?\d+(?:\.\d+)?$/;

/**
 * Free text as a spreadsheet-safe cell: a cell that would start a formula gets a single quote in
 * front (OWASP "CSV Injection": "prepend each cell field with a single quote"), which spreadsheets
 * take as "this is text". Quoting of commas, quotes and line breaks is csv-stringify's (RFC 4180).
 *
 * Only text people typed goes through here (names, references, reasons, number prefixes). Amounts
 * and dates never do: we write them ourselves as plain decimals ("-25.00") and ISO dates, so a
 * negative amount still reads as a number; a typed plain decimal is left as one for the same reason.
 */
export function neutralise(text: string): string {
  return FORMULA_START.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
}
