/**
 * Formula-safe CSV cells, shared by every CSV download (aircraft catalogue, fleet rows, results).
 *
 * A spreadsheet evaluates a cell that starts with `=`, `+`, `-` or `@` (and, in some programs, one
 * that starts with a tab or a carriage return) as a formula, so a name such as `=HYPERLINK(…)` in a
 * downloaded file could run when a reviewer opens it. Such a cell is written with one leading single
 * quote (`'=HYPERLINK(…)`), which spreadsheets show as text (OWASP, "CSV Injection"). A plain decimal
 * number (`-12.5`, `+3`, `1e-3`) is left as it is: it is not a formula, and numeric columns must stay
 * numbers. A cell that already starts with quotes followed by one of those characters gets one more
 * quote, so that the importer's rule (`restoreCsvCell`: strip exactly one leading quote when what
 * follows is quotes and then one of those characters) gives back the original text in every case.
 * Documented in docs/storage.md ("CSV files").
 */

/** A cell a spreadsheet could read as a formula: optional leading quotes, then = + - @ tab or CR. */
const FORMULA_START = /^'*[=+\-@\t\r]/;
/** The same, after the one quote the export adds. */
const NEUTRALISED = /^''*[=+\-@\t\r]/;
/** A plain decimal number: the importer's rule for numeric cells (server/io/csv.ts). */
export const PLAIN_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** One cell as written to a CSV download: formula-like text gets a leading single quote. */
export function csvSafeCell(cell: string): string {
  return FORMULA_START.test(cell) && !PLAIN_NUMBER.test(cell) ? `'${cell}` : cell;
}

/** Every cell of every record through `csvSafeCell` (call it on the records given to `stringify`). */
export function csvSafeRecords(records: readonly (readonly string[])[]): string[][] {
  return records.map((r) => r.map(csvSafeCell));
}

/** The inverse, for imports: strips the one quote `csvSafeCell` adds, and nothing else. */
export function restoreCsvCell(cell: string): string {
  return NEUTRALISED.test(cell) ? cell.slice(1) : cell;
}
