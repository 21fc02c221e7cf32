import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { commentPieces, stepsReferred, type CommentPiece } from './step-references';

const joined = (pieces: readonly CommentPiece[]) => pieces.map((p) => p.text).join('');
const steps = (pieces: readonly CommentPiece[]) =>
  pieces.flatMap((p) => (p.kind === 'step' ? [[p.text, p.step]] : []));

describe('commentPieces: step references in a checker’s comment', () => {
  it('links "step 4" whole, in any case, amid text', () => {
    const pieces = commentPieces('See step 4: the basis. Step 12 too.');
    expect(pieces).toEqual([
      { kind: 'text', text: 'See ' },
      { kind: 'step', text: 'step 4', step: 4 },
      { kind: 'text', text: ': the basis. ' },
      { kind: 'step', text: 'Step 12', step: 12 },
      { kind: 'text', text: ' too.' },
    ]);
  });

  it('links each number of "steps 4 and 7", lists with commas, "or", ranges with a dash', () => {
    expect(steps(commentPieces('steps 4 and 7 disagree'))).toEqual([
      ['4', 4],
      ['7', 7],
    ]);
    expect(joined(commentPieces('steps 4 and 7 disagree'))).toBe('steps 4 and 7 disagree');
    expect(steps(commentPieces('Steps 3, 5 and 9.'))).toEqual([
      ['3', 3],
      ['5', 5],
      ['9', 9],
    ]);
    expect(steps(commentPieces('steps 3, 5, or 9'))).toEqual([
      ['3', 3],
      ['5', 5],
      ['9', 9],
    ]);
    expect(steps(commentPieces('steps 4–7 and step #9'))).toEqual([
      ['4', 4],
      ['7', 7],
      ['step #9', 9],
    ]);
  });

  it('leaves what is not a step reference as text', () => {
    for (const text of [
      'a step 4.5 mm further',
      'the 4th step',
      'footsteps 4',
      'step 4b',
      'stepping 3',
      'no numbers here',
      '',
    ]) {
      expect(commentPieces(text).every((p) => p.kind === 'text')).toBe(true);
      expect(joined(commentPieces(text))).toBe(text);
    }
  });

  it('with the trail’s step count, a number the trail does not have stays text', () => {
    expect(steps(commentPieces('step 0, step 30 and steps 2 and 31', 30))).toEqual([
      ['step 30', 30],
      ['2', 2],
    ]);
    expect(joined(commentPieces('steps 2 and 31', 30))).toBe('steps 2 and 31');
  });

  it('stepsReferred: distinct numbers in order of first mention', () => {
    expect(stepsReferred('step 7, then steps 2 and 7, then step 3')).toEqual([7, 2, 3]);
  });

  it('joined back, the pieces are the comment, whatever it says (property, fast-check)', () => {
    const words = fc.constantFrom(
      'step',
      'steps',
      'Step',
      ' ',
      '4',
      '12',
      'and',
      ',',
      '–',
      '.',
      'x',
      '#',
    );
    fc.assert(
      fc.property(
        fc.array(words, { maxLength: 30 }).map((w) => w.join('')),
        fc.string(),
        (a, b) => {
          const text = a + b;
          const pieces = commentPieces(text);
          expect(joined(pieces)).toBe(text);
          // No two text pieces side by side.
          pieces.forEach((p, i) => {
            if (i > 0) expect(p.kind === 'text' && pieces[i - 1]!.kind === 'text').toBe(false);
          });
        },
      ),
      { numRuns: 2000 },
    );
  });
});
