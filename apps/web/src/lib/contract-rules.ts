import type { z } from 'zod';
import * as yup from 'yup';

/**
 * A form field whose rule is a schema of the API's contract or the engine
 * (a length bound, an e-mail, a quantity's range), not a copy of it: the
 * value is checked with that schema and its message shown after the field's
 * words ("Project name must be at most 200 characters"). Only what is the
 * form's own (that a field must be filled in, that two passwords match) stays
 * in yup.
 */
export function ruleOf(schema: z.ZodType, words: string) {
  return (value: string | undefined, context: yup.TestContext): true | yup.ValidationError => {
    if (value === undefined || value.trim() === '') return true;
    const parsed = schema.safeParse(value);
    if (parsed.success) return true;
    return context.createError({
      message: `${words} ${parsed.error.issues[0]?.message ?? 'cannot be read'}`,
    });
  };
}

/** A text field checked by a contract field's schema; `required` gives the message for an empty one. */
export function contractText(schema: z.ZodType, words: string, required?: string) {
  const base = yup.string().trim();
  return (required ? base.required(required) : base).test('contract', ruleOf(schema, words));
}
