/**
 * Return paths (`back`, `next`) holding CR, LF or NUL are refused with 400 before anything else reads
 * them: such a value can only be forged (a browser never sends one from Runwright's own forms), and
 * placed in a Location header it would make the reply invalid. Other unsafe paths (tabs, `//`,
 * schemes) are normalised to a safe fallback by `safeBack` (server/web/page.tsx).
 */
import type { Context } from 'hono';
import { ProblemPage } from '../../templates/errors.js';
import type { AppEnv } from './env.js';
import { page } from './page.js';

const FORBIDDEN = /[\r\n\u0000]/;
const NAMES: Readonly<Record<string, string>> = { '\r': 'a carriage return (CR)', '\n': 'a line feed (LF)', '\u0000': 'a NUL character' };

/** The message for a return path holding CR, LF or NUL, or undefined when it holds none. */
export function returnPathProblem(name: string, value: string | undefined): string | undefined {
  if (value === undefined) return undefined;
  const i = value.search(FORBIDDEN);
  if (i < 0) return undefined;
  return `The "${name}" value holds ${NAMES[value[i]!]} at character ${i + 1}; a return path is a plain site path such as /studies. Nothing was changed.`;
}

/** A 400 page when `value` holds CR, LF or NUL; undefined when the request may go on. */
export function refuseBadReturnPath(c: Context<AppEnv>, name: string, value: string | undefined): Response | undefined {
  const problem = returnPathProblem(name, value);
  if (problem === undefined) return undefined;
  return page(c, { title: 'Bad request', status: 400 }, () => <ProblemPage title="Bad request" message={problem} />);
}
