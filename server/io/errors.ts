/**
 * Import problems. Every import is all-or-nothing: when any problem is found, `ImportError` is thrown
 * before anything is written, listing each problem with its line, column and reason.
 */

export interface ImportProblem {
  /** 1-based line in the file, when the problem has a place. */
  readonly line?: number;
  /** 1-based character column on the line (JSON files). */
  readonly column?: number;
  /** The CSV column (header name), or the JSON path of the value (e.g. `aircraft[2].mtow_kg`). */
  readonly field?: string;
  readonly reason: string;
}

/** At most this many problems are collected before an import stops looking. */
export const MAX_PROBLEMS = 50;

export function formatProblem(p: ImportProblem): string {
  const where: string[] = [];
  if (p.line !== undefined) where.push(`line ${p.line}`);
  if (p.column !== undefined) where.push(`column ${p.column}`);
  if (p.field !== undefined) where.push(p.column === undefined ? `column ${JSON.stringify(p.field)}` : `at ${p.field}`);
  return where.length === 0 ? p.reason : `${where.join(', ')}: ${p.reason}`;
}

export class ImportError extends Error {
  override readonly name = 'ImportError';
  constructor(
    /** What was being imported, e.g. "aircraft CSV". */
    readonly what: string,
    readonly problems: readonly ImportProblem[],
  ) {
    const first = problems[0] ? formatProblem(problems[0]) : 'unknown problem';
    const more = problems.length > 1 ? ` (and ${problems.length - 1} more problem${problems.length > 2 ? 's' : ''})` : '';
    super(`${what} rejected, nothing was imported: ${first}${more}`);
  }
}
