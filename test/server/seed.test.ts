/** First start seeds the demo with its saved results; a second start changes nothing. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { inputsChangedSinceSave, listStudyResults, loadStudyInput, openDatabase } from '../../db/index.js';
import { seedDemoWithResults } from '../../server/seed.js';
import { inputDigest, parseStudyDocument } from '../../server/studies/document.js';

describe('seedDemoWithResults', () => {
  it('saves results matching the seeded input once', () => {
    const parsed = parseStudyDocument(JSON.parse(readFileSync(new URL('../../examples/demo-study.json', import.meta.url), 'utf8')));
    if (!parsed.ok) throw new Error('demo invalid');
    const { db, sqlite } = openDatabase(':memory:');
    try {
      const first = seedDemoWithResults(db, parsed.input, new Date('2026-12-02T00:00:00Z'));
      expect(first.seeded).toBe(true);
      if (!first.seeded) return;
      const digest = inputDigest(loadStudyInput(db, first.studyId));
      expect(inputsChangedSinceSave(db, first.studyId, digest).state).toBe('unchanged');
      expect(seedDemoWithResults(db, parsed.input, new Date()).seeded).toBe(false);
      expect(listStudyResults(db, first.studyId)).toHaveLength(1);
    } finally {
      sqlite.close();
    }
  });
});
