import { describe, expect, it } from 'vitest';
import { METHODS } from '../screen';
import { describeFields } from './describe';
import { COMMON_VOCABULARY, wordsFor } from './vocabulary';

describe('every method owns the words of every field it accepts', () => {
  it.each(METHODS.map((m) => [m.kind, m] as const))('%s', (_kind, method) => {
    const fields = describeFields(method.schema);
    const missing: string[] = [];
    for (const field of fields) {
      const words = wordsFor(method.vocabulary, field.path);
      if (!words || words.label.trim() === '') {
        missing.push(field.path);
        continue;
      }
      // A label is words, not the field's id ("diameterBasis", "ringSpacingFor").
      const last = field.path.split('.').pop()!;
      if (/[a-z][A-Z]/.test(last)) expect(words.label).not.toContain(last);
      for (const option of field.options ?? []) {
        if (!words.options?.[option]) missing.push(`${field.path} = ${option}`);
      }
    }
    expect(missing, `fields without words in ${method.kind}'s vocabulary`).toEqual([]);
    // And no words for a field the schema no longer has.
    const paths = new Set(fields.map((f) => f.path));
    const stale = Object.keys(method.vocabulary).filter((p) => !paths.has(p));
    expect(stale, `words in ${method.kind}'s vocabulary for fields it does not have`).toEqual([]);
  });

  it('labels the shared fields once', () => {
    expect(COMMON_VOCABULARY['loadCases.*.internal']?.label).toBe('Pressure inside');
    expect(COMMON_VOCABULARY['site.altitude']?.label).toBe('Site altitude');
  });

  it('describes a field’s dimension and whether it may be left out, from the schema itself', () => {
    const shell = METHODS.find((m) => m.kind === 'cylindrical-shell')!;
    const fields = describeFields(shell.schema);
    expect(fields.find((f) => f.path === 'thickness')).toMatchObject({
      type: 'quantity',
      dimension: 'length',
      optional: false,
    });
    expect(fields.find((f) => f.path === 'ringSpacingFor')).toMatchObject({ optional: true });
    expect(fields.find((f) => f.path === 'loadCases.*.internal')).toMatchObject({
      dimension: 'pressure',
      pressureKind: 'load-case',
    });
    expect(fields.find((f) => f.path === 'site.altitude')).toMatchObject({ optional: true });
  });
});
