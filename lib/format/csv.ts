/** A field that must be quoted: it holds a double quote, a comma, a carriage return or a line feed. */
const NEEDS_QUOTES = /[",\r\n]/;

/**
 * One CSV field: as is, or enclosed in double quotes with each double quote doubled when it holds a
 * quote, a comma or a line break. Numbers are written with String().
 *
 * @param value the field's text or number
 * @example csvField('a "b", c') // '"a ""b"", c"'
 * Reference: RFC 4180 (2005) §2 rules 5–7.
 */
export function csvField(value: string | number): string {
  const text = String(value);
  return NEEDS_QUOTES.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/**
 * CSV text of a table, one record a line: fields separated by commas and every record, the last one too,
 * ended by CRLF.
 *
 * @param records rows of fields; the first row is usually the header
 * @example toCsv([['Size', 'Span'], ['2x10', '12-3']]) // "Size,Span\r\n2x10,12-3\r\n"
 * Reference: RFC 4180 (2005) §2 rules 1–7.
 */
export function toCsv(records: readonly (readonly (string | number)[])[]): string {
  return records.map((record) => `${record.map(csvField).join(',')}\r\n`).join('');
}
