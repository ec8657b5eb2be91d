/** The committed JSON Schema of the study file matches the zod schema (run `npm run schema` to refresh). */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { studyJsonSchema } from '../../server/common/jsonSchema.js';

describe('docs/study.schema.json', () => {
  it('is up to date with server/studies/schema.ts', () => {
    const committed = readFileSync(new URL('../../docs/study.schema.json', import.meta.url), 'utf8');
    expect(committed).toBe(JSON.stringify(studyJsonSchema(), null, 2) + '\n');
  });
  it('carries the physical ranges (e.g. site elevation −400 … 4500 m)', () => {
    const s = studyJsonSchema() as { properties: { site: { properties: { elevation_m: { minimum: number; maximum: number } } } } };
    expect(s.properties.site.properties.elevation_m).toMatchObject({ minimum: -400, maximum: 4500 });
  });
});
