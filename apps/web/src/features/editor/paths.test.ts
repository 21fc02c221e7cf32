import { describe, expect, it } from 'vitest';
import { getIn, sameInputs, setIn } from './paths';
import { editorReducer, numberFromText } from './editor-state';

describe('input paths', () => {
  it('reads and writes dotted paths with list indices, as the engine names issues', () => {
    const raw = {
      loadCases: [{ name: 'a', internal: 'full vacuum' }],
      outline: { shape: 'circle' },
    };
    expect(getIn(raw, 'loadCases.0.internal')).toBe('full vacuum');
    const next = setIn(raw, 'loadCases.0.internal', '10 torr');
    expect(getIn(next, 'loadCases.0.internal')).toBe('10 torr');
    expect(raw.loadCases[0]!.internal).toBe('full vacuum');
    expect(setIn(raw, 'outline.sealDiameter', '500 mm')).toEqual({
      loadCases: raw.loadCases,
      outline: { shape: 'circle', sealDiameter: '500 mm' },
    });
  });

  it('removes an optional field left blank', () => {
    expect(setIn({ a: 1, b: 2 }, 'b', undefined)).toEqual({ a: 1 });
  });

  it('compares inputs by content, not key order', () => {
    expect(sameInputs({ a: 1, b: [1, { c: 2 }] }, { b: [1, { c: 2 }], a: 1 })).toBe(true);
    expect(sameInputs({ a: 1 }, { a: '1' })).toBe(false);
  });
});

describe('editor state', () => {
  it('keeps the typed text of a number field and gives the engine a number', () => {
    const state = editorReducer(
      { raw: {}, texts: {}, edits: 0 },
      { type: 'number', path: 'designFactor', text: '1.' },
    );
    expect(state.texts['designFactor']).toBe('1.');
    expect(state.raw['designFactor']).toBe(1);
    expect(numberFromText('two')).toBe('two');
    expect(numberFromText(' ')).toBeUndefined();
  });
  it('treats an emptied text field as absent', () => {
    const state = editorReducer(
      { raw: { tag: 'x' }, texts: {}, edits: 0 },
      { type: 'set', path: 'tag', value: '' },
    );
    expect(state.raw).toEqual({});
    expect(state.edits).toBe(1);
  });
});
