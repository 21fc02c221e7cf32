import fc from 'fast-check';

/**
 * What the fuzzer sends: a JSON value (serialised by the client), raw text
 * with a content type of its own (non-finite numbers, own __proto__ keys,
 * broken JSON, the wrong type), or a multipart upload.
 */
export type Payload =
  | { readonly kind: 'none' }
  | { readonly kind: 'json'; readonly value: unknown }
  | { readonly kind: 'raw'; readonly contentType: string; readonly text: string }
  | {
      readonly kind: 'multipart';
      readonly fileName: string;
      readonly bytes: Buffer;
      readonly fields?: Record<string, string>;
    };

/** Text that breaks things: NUL, lone surrogates, bidi overrides, SQL and path tricks, huge strings. */
export const hostileText = fc.oneof(
  fc.string({ unit: 'grapheme', maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.constantFrom(
    '',
    ' ',
    '\u0000',
    'a\u0000b',
    '\ud800',
    'x\udfffy',
    '\u202eexe.pdf',
    '\ufeff',
    "'; drop table users; --",
    '../../etc/passwd',
    '%2e%2e%2f',
    '__proto__',
    'constructor',
    '{{7*7}}',
    '<script>alert(1)</script>',
    'NaN',
    'Infinity',
    '-0',
    '1e309',
    '12 mm',
    '-12 mm',
    'full vacuum',
    '0x10',
    'é'.repeat(300),
    '𝕏'.repeat(200),
  ),
  fc.integer({ min: 1000, max: 300_000 }).map((n) => 'x'.repeat(n)),
);

export const hostileNumber = fc.oneof(
  fc.double(),
  fc.integer(),
  fc.constantFrom(
    0,
    -0,
    1e308,
    -1e308,
    Number.MAX_VALUE,
    Number.MIN_VALUE,
    Number.MAX_SAFE_INTEGER + 2,
    -Number.MAX_SAFE_INTEGER - 2,
    1e20,
    0.1 + 0.2,
  ),
);

/** A value of any JSON shape, prototype-looking keys included (as own keys once serialised). */
export const hostileValue: fc.Arbitrary<unknown> = fc.letrec<{ value: unknown }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    hostileText,
    hostileNumber,
    fc.boolean(),
    fc.constant(null),
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(
      fc.oneof(
        fc.string({ maxLength: 8 }),
        fc.constantFrom('__proto__', 'constructor', 'prototype'),
      ),
      tie('value'),
      { maxKeys: 4 },
    ),
  ),
})).value;

/**
 * JSON nested `depth` levels deep, written as text (JSON.stringify itself
 * overflows the stack long before the server's parser would): arrays,
 * objects, or a valid body with the nesting inside one of its fields.
 */
export function deeplyNested(valid: Record<string, unknown>): fc.Arbitrary<Payload> {
  const key = Object.keys(valid)[0] ?? 'x';
  return fc
    .tuple(fc.integer({ min: 100, max: 200_000 }), fc.constantFrom('array', 'object', 'field'))
    .map(([depth, shape]) => {
      const nest =
        shape === 'array'
          ? `${'['.repeat(depth)}1${']'.repeat(depth)}`
          : `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`;
      // "field": the valid body with its first field given again, nested (JSON.parse keeps the last).
      const text =
        shape === 'field' ? JSON.stringify(valid).replace(/\}$/, `,"${key}":${nest}}`) : nest;
      return { kind: 'raw' as const, contentType: 'application/json', text };
    });
}

/** A valid body with one field replaced by something hostile, or one field added or taken away. */
export function mutated(valid: Record<string, unknown>): fc.Arbitrary<unknown> {
  const keys = Object.keys(valid);
  if (keys.length === 0) return fc.dictionary(fc.string({ maxLength: 6 }), hostileValue);
  return fc.oneof(
    fc
      .tuple(fc.constantFrom(...keys), hostileValue)
      .map(([key, value]) => ({ ...valid, [key]: value })),
    fc.tuple(fc.string({ maxLength: 12 }), hostileValue).map(([key, value]) => ({
      ...valid,
      [key]: value,
    })),
    fc.constantFrom(...keys).map((key) => {
      const copy = { ...valid };
      delete copy[key];
      return copy;
    }),
    // Nested fields (inputs.*, site.*) get the same treatment one level down.
    fc.constantFrom(...keys).chain((key) => {
      const inner = valid[key];
      if (!inner || typeof inner !== 'object' || Array.isArray(inner)) return fc.constant(valid);
      return mutated(inner as Record<string, unknown>).map((m) => ({ ...valid, [key]: m }));
    }),
  );
}

/** Raw bodies JSON.stringify cannot make: non-finite numbers, own __proto__ keys, broken JSON, wrong types. */
export function rawBodies(valid: Record<string, unknown>): fc.Arbitrary<Payload> {
  const json = JSON.stringify(valid);
  const firstKey = Object.keys(valid)[0] ?? 'x';
  return fc.oneof(
    fc
      .constantFrom('1e999', '-1e999', 'NaN', 'Infinity', '-Infinity', '1e-400', '00012', '-')
      .map((n) => ({
        kind: 'raw' as const,
        contentType: 'application/json',
        text: json.replace(/^\{/, `{"${firstKey}":${n},`),
      })),
    fc
      .constantFrom(
        `{"__proto__":{"isAdmin":true},${json.slice(1)}`,
        `{"constructor":{"prototype":{"isAdmin":true}},${json.slice(1)}`,
        `{${json.slice(1, -1)},"__proto__":null}`,
        json.slice(0, Math.max(1, json.length - 3)),
        `${json}${json}`,
        `[${json}]`,
        `"${'a'.repeat(10)}"`,
        'null',
        'true',
        '',
        '\u0000',
        json.replace(/"/, '"\\u0000'),
      )
      .map((text) => ({ kind: 'raw' as const, contentType: 'application/json', text })),
    fc
      .constantFrom(
        'text/plain',
        'application/x-www-form-urlencoded',
        'application/xml',
        'multipart/form-data; boundary=x',
        'application/json; charset=utf-16',
        'application/octet-stream',
        'text/csv',
      )
      .map((contentType) => ({ kind: 'raw' as const, contentType, text: json })),
    // Over the 1 MB JSON limit: a 413, read no further.
    fc.constant({
      kind: 'raw' as const,
      contentType: 'application/json',
      text: `{"${firstKey}":"${'x'.repeat(1_100_000)}"}`,
    }),
  );
}

/** Every kind of body for a route whose valid body is `valid`. */
export function bodies(valid: Record<string, unknown>): fc.Arbitrary<Payload> {
  return fc.oneof(
    { weight: 5, arbitrary: mutated(valid).map((value) => ({ kind: 'json' as const, value })) },
    { weight: 2, arbitrary: hostileValue.map((value) => ({ kind: 'json' as const, value })) },
    { weight: 1, arbitrary: deeplyNested(valid) },
    { weight: 3, arbitrary: rawBodies(valid) },
  );
}
