/**
 * Characters that make a spreadsheet read a cell as a formula when they come first: OWASP "CSV
 * Injection" lists = + - @, tab (0x09) and carriage return (0x0D); OWASP ASVS 5.0 1.2.10 adds the
 * null character (0x00).
 */
const FORMULA_START = /^[=+\-@\t\r\0]/;

/**
 * Free text as a spreadsheet-safe cell: a cell that would start a formula gets a single quote in
 * front (OWASP "CSV Injection": "prepend each cell field with a single quote"), which spreadsheets
 * take as "this is text". Quoting of commas, quotes and line breaks is csv-stringify's (RFC 4180).
 *
 * Only text people typed goes through here (names, references, reasons, number prefixes). Amounts
 * and dates never do: we write them ourselves as plain decimals ("-25.00") and ISO dates, so a
 * negative amount still reads as a number.
 */
export function neutralise(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}
