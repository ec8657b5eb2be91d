/** The reviewer's methods document: the topic files of docs/methods/ in reading order, with a contents list. */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** Reading order of the topic files. */
export const METHOD_TOPICS = [
  'study.md',
  'atmosphere-climate-runway.md',
  'takeoff.md',
  'landing-corrections-classification.md',
  'route.md',
  'calibration-existing-runway.md',
  'demo-fleet.md',
] as const;

const dir = fileURLToPath(new URL('../../docs/methods/', import.meta.url));

export function methodTopic(file: string): string {
  return readFileSync(dir + file, 'utf8');
}

export function methodsDocument(): string {
  const parts = METHOD_TOPICS.map((f) => methodTopic(f).trim());
  const titles = parts.map((p) => /^#\s+(.+)$/m.exec(p)?.[1] ?? 'Untitled');
  const head = [
    '# Runwright methods',
    '',
    'Every method Runwright uses, with its formulas, published source, validity range and known limits.',
    'Generated from the topic files in `docs/methods/` by `npm run docs:methods`; edit those, not this file.',
    '',
    '> Runway lengths from Runwright are preliminary planning estimates. Final lengths must follow the',
    "> aircraft manufacturer's planning data, the advisory guidance of the aviation authority with",
    '> jurisdiction, and review by a licensed engineer. Not for flight planning or dispatch.',
    '',
    '## Contents',
    '',
    ...titles.map((t, i) => `${i + 1}. ${t}`),
    '',
  ].join('\n');
  // Topic headings move down one level under the document title.
  const body = parts.map((p) => p.replace(/^(#+)/gm, '#$1')).join('\n\n---\n\n');
  return `${head}\n${body}\n`;
}
