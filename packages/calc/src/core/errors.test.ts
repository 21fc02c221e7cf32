import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { issuesFromZod } from './errors';
import { materialSchema } from '../materials/materials';

const issues = (schema: z.ZodType, value: unknown) => {
  const result = schema.safeParse(value);
  if (result.success) throw new Error('expected a failure');
  return issuesFromZod(result.error);
};

describe('issuesFromZod: messages a person can act on, each naming its field', () => {
  it('says a missing field is required and names a wrong type', () => {
    const schema = z.object({ name: z.string(), count: z.number() }).strict();
    expect(issues(schema, { count: 'three', extra: 1 })).toEqual([
      { path: 'name', message: 'is required' },
      { path: 'count', message: 'must be a number' },
      { path: '', message: 'unknown field "extra"' },
    ]);
  });

  it('words zod’s default size messages, and keeps a schema’s own', () => {
    const schema = z.object({
      tag: z.string().max(3),
      cases: z.array(z.number()).min(1),
      note: z.string().min(2, 'needs two letters'),
    });
    expect(issues(schema, { tag: 'TOO-LONG', cases: [], note: 'x' })).toEqual([
      { path: 'tag', message: 'must be at most 3 characters' },
      { path: 'cases', message: 'must have at least 1 item' },
      { path: 'note', message: 'needs two letters' },
    ]);
  });

  it('names the field inside the union option the value is shaped like', () => {
    expect(
      issues(materialSchema, { name: 'Mine', elasticModulus: '200 GPa', poissonRatio: 0.3 }),
    ).toEqual([{ path: 'strength', message: 'is required' }]);
  });
});
