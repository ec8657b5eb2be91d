/** docs/methods.md is the assembled topic files (run `npm run docs:methods` after editing docs/methods/). */
import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { METHOD_TOPICS, methodsDocument } from '../../server/docs/methods.js';

describe('docs/methods.md', () => {
  it('is up to date', () => {
    expect(readFileSync(new URL('../../docs/methods.md', import.meta.url), 'utf8')).toBe(methodsDocument());
  });
  it('includes every topic file in docs/methods/', () => {
    const files = readdirSync(new URL('../../docs/methods/', import.meta.url)).filter((f) => f.endsWith('.md')).sort();
    expect([...METHOD_TOPICS].sort()).toEqual(files);
  });
});
