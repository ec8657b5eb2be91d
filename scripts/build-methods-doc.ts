/**
 * Assembles docs/methods.md from the topic files in docs/methods/ (`npm run docs:methods`).
 * test/docs/methods.test.ts fails when docs/methods.md is out of date.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { methodsDocument } from '../server/docs/methods.js';

const target = fileURLToPath(new URL('../docs/methods.md', import.meta.url));
writeFileSync(target, methodsDocument());
console.log(`wrote ${target}`);
