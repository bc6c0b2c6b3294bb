/**
 * Splits CSV text into rows of cells with papaparse (a maintained RFC 4180 parser that also reads what
 * spreadsheets write: semicolon or tab delimiters, CR, LF or CRLF line ends, a UTF-8 byte-order mark).
 */
import Papa from 'papaparse';

export interface CsvTable {
  /** Rows of cells as strings, in file order; blank lines kept as [''] so row numbers match the file. */
  rows: string[][];
  /** The delimiter papaparse detected (',' unless the file used ';', tab, '|'). */
  delimiter: string;
  /** Parser complaints (unclosed quotes), by 0-based row. */
  problems: { rowIndex: number | undefined; message: string }[];
}

/** Parses `text` into rows without interpreting a header; never throws. */
export function readCsvTable(text: string): CsvTable {
  const result = Papa.parse<string[]>(text, { header: false, skipEmptyLines: false, dynamicTyping: false });
  const problems = result.errors
    // Papa reports "UndetectableDelimiter" for one-column files, which are fine: it falls back to ','.
    .filter((error) => error.code !== 'UndetectableDelimiter')
    .map((error) => ({ rowIndex: error.row, message: error.message }));
  // A file ending in a line break gives one trailing empty row; drop it so row counts stay honest.
  const rows = result.data;
  const last = rows[rows.length - 1];
  if (last !== undefined && last.length === 1 && last[0] === '') rows.pop();
  return { rows, delimiter: result.meta.delimiter, problems };
}
