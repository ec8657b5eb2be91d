/**
 * First start: seed the invented demo into an empty database and save its results, so the demo opens
 * with a results page. Later starts change nothing.
 */
import { loadStudyInput, saveStudyResult, seedDemoIfEmpty, type Db } from '../db/index.js';
import type { StudyInput } from '../core/index.js';
import { studyOutput } from './studies/index.js';

export function seedDemoWithResults(db: Db, demo: StudyInput, now: Date): ReturnType<typeof seedDemoIfEmpty> {
  const seeded = seedDemoIfEmpty(db, demo);
  if (seeded.seeded) {
    const input = loadStudyInput(db, seeded.studyId);
    const output = studyOutput(input);
    saveStudyResult(db, {
      studyId: seeded.studyId, input, inputDigest: output.inputDigest, result: output, methodVersion: output.methodVersion, createdAt: now,
    });
  }
  return seeded;
}
