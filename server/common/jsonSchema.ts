/** JSON Schema (draft 2020-12) of the study file, generated from the zod schema (input side). */
import { z } from 'zod';
import { studyFileSchema } from '../studies/index.js';

export function studyJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(studyFileSchema, { io: 'input', unrepresentable: 'any' }) as Record<string, unknown>;
  return {
    ...schema,
    $id: 'https://runwright.invalid/schemas/study.schema.json',
    title: 'Runwright study file',
    description: 'A runway length study: site, aircraft profiles, fleet scenarios and options. SI quantities with the unit as a key suffix.',
  };
}
