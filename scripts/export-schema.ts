/**
 * Writes docs/study.schema.json from the zod study-file schema (`npm run schema`).
 * test/server/schema.test.ts fails when the committed file is out of date.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { studyJsonSchema } from '../server/common/jsonSchema.js';

const target = fileURLToPath(new URL('../docs/study.schema.json', import.meta.url));
writeFileSync(target, JSON.stringify(studyJsonSchema(), null, 2) + '\n');
console.log(`wrote ${target}`);
