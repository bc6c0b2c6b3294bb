/**
 * RFC 4180 CSV writer that is safe to open in a spreadsheet.
 *
 * Format (RFC 4180 section 2): records end with CRLF (the last one too, which 2.2 allows); a field is wrapped in
 * double quotes when it contains a double quote, a comma, CR or LF (2.6), and a double quote inside a quoted field
 * is doubled (2.7).
 *
 * Formula injection (OWASP "CSV Injection"; OWASP ASVS 5.0 requirement 1.2.10): spreadsheets run a cell as a
 * formula when its first character is `=`, `+`, `-` or `@`, and tab, CR and NUL are listed beside them because
 * some programs strip them before looking. Decision:
 * - TEXT cells (anything a person typed: names, notes, labels) that start with one of those characters get a
 *   leading apostrophe, which spreadsheets show as text and which the reader can remove with
 *   {@link restoreNeutralisedText};
 * - NUMBER cells that this program computes are written with {@link csvNumber} as plain decimal numerals
 *   (`-0.125`), never neutralised: a spreadsheet reads them as numbers, which is what an engineer wants, and no
 *   user text can reach them because they are formatted from a finite `number`.
 *
 * Byte-order mark: Excel decodes a .csv opened directly (double-click) with the system code page unless the file
 * starts with a UTF-8 byte-order mark, which garbles names such as "Łódź"; LibreOffice asks for the encoding and
 * CSV parsers (papaparse strips it) do not need it. The inspection log is for spreadsheets, so the mark is on by
 * default ({@link DEFAULT_CSV_BYTE_ORDER_MARK}) and can be switched off.
 */

/** A number cell: already formatted at a fixed precision, written as is. */
export interface CsvNumberCell {
  readonly kind: 'csv-number';
  readonly text: string;
}

/** Text (neutralised when it looks like a formula), a computed number, or empty. */
export type CsvCell = string | CsvNumberCell | null | undefined;

export interface CsvWriteOptions {
  /** Start the text with U+FEFF so Excel reads UTF-8; default {@link DEFAULT_CSV_BYTE_ORDER_MARK}. */
  byteOrderMark?: boolean;
}

/** On by default: Excel, the most common reader of the log, needs it for non-ASCII text (see file comment). */
export const DEFAULT_CSV_BYTE_ORDER_MARK = true;

export const CSV_BYTE_ORDER_MARK = '\ufeff';

/** RFC 4180 section 2.1: every record ends with CRLF. */
export const CSV_LINE_END = '\r\n';

/** First characters that make a spreadsheet treat a cell as a formula (OWASP CSV Injection; ASVS 1.2.10). */
export const FORMULA_TRIGGERS: readonly string[] = ['=', '+', '-', '@', '\t', '\r', '\0'];

const NEEDS_QUOTES = /[",\r\n]/;
const MINUS = 0x2d;
const NEGATIVE_ZERO = /^-0(\.0*)?$/;

/**
 * A computed number for a CSV cell with a fixed number of decimals (0–20). Non-finite values give an empty
 * cell rather than "NaN" or "Infinity". Negative zero prints as zero.
 */
export function csvNumber(value: number | null | undefined, decimals: number): CsvNumberCell | null {
  if (value === null || value === undefined || !Number.isFinite(value)) return null;
  const text = value.toFixed(decimals);
  // toFixed keeps the sign of values that round to zero ("-0.000"); a spreadsheet would show "-0".
  return {
    kind: 'csv-number',
    text: text.charCodeAt(0) === MINUS && NEGATIVE_ZERO.test(text) ? text.slice(1) : text,
  };
}

/** True when a spreadsheet would run this text as a formula. */
export function looksLikeFormula(text: string): boolean {
  return text.length > 0 && FORMULA_TRIGGERS.includes(text.charAt(0));
}

/** Apostrophes (any number, none included) then a trigger: the texts that get one more apostrophe. */
function apostrophesThenTrigger(text: string, minimumApostrophes: number): boolean {
  let index = 0;
  while (text.charAt(index) === "'") index += 1;
  return index >= minimumApostrophes && looksLikeFormula(text.slice(index));
}

/**
 * Prefixes an apostrophe to text a spreadsheet would run as a formula. Text that already starts with
 * apostrophes followed by a trigger ("'=x") gets one more too, so that {@link restoreNeutralisedText} gives back
 * exactly what was written; all other text is returned unchanged.
 */
export function neutraliseFormula(text: string): string {
  return apostrophesThenTrigger(text, 0) ? `'${text}` : text;
}

/**
 * Undoes {@link neutraliseFormula} on a cell read back from one of our files: removes one leading apostrophe
 * when apostrophes are followed by a formula trigger; other text (e.g. "'tis") is kept as is.
 */
export function restoreNeutralisedText(cell: string): string {
  return apostrophesThenTrigger(cell, 1) ? cell.slice(1) : cell;
}

/** One field, neutralised (text only) and quoted per RFC 4180 sections 2.6 and 2.7. */
export function csvField(cell: CsvCell): string {
  if (cell === null || cell === undefined) return '';
  const text = typeof cell === 'string' ? neutraliseFormula(cell) : cell.text;
  return NEEDS_QUOTES.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** One record with its CRLF. */
export function csvRecord(cells: readonly CsvCell[]): string {
  return cells.map(csvField).join(',') + CSV_LINE_END;
}

/** A whole file: header, then rows, each ending in CRLF, with the byte-order mark per the options. */
export function writeCsv(
  header: readonly string[],
  rows: Iterable<readonly CsvCell[]>,
  options: CsvWriteOptions = {},
): string {
  const parts: string[] = [];
  if (options.byteOrderMark ?? DEFAULT_CSV_BYTE_ORDER_MARK) parts.push(CSV_BYTE_ORDER_MARK);
  parts.push(csvRecord(header));
  for (const row of rows) parts.push(csvRecord(row));
  return parts.join('');
}
