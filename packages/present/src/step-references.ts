/**
 * Step references in a checker's free comment (issue 16.1): "step 4",
 * "Step 12", "steps 4 and 7", "steps 3, 5 and 9", "steps 4–7" are cut out
 * so the screen can link each to that trail step (numbered as
 * numberedSteps numbers them, the numbers the sign-off form asks for).
 * Pure: text in, pieces out; joined back, the pieces are the text.
 */

/** A piece of the comment: plain text, or a reference to one trail step. */
export type CommentPiece =
  | { readonly kind: 'text'; readonly text: string }
  | { readonly kind: 'step'; readonly text: string; readonly step: number };

// "step"/"steps" (any case), then a number, then any further numbers joined by
// commas, "and", "or", "&", "to" or a dash. A number is whole: not followed by
// a decimal part ("step 4.5" is not a step) nor letters ("step 4b").
const NUMBER = String.raw`\d{1,5}(?![\d.,]\d|[\p{L}\d])`;
const JOIN = String.raw`\s*(?:,\s*(?:and\s+|or\s+)?|\s(?:and|or|to)\s|&|[–—-])\s*`;
const REFERENCE = new RegExp(
  String.raw`(?<![\p{L}\d])(steps?)(\s+|\s*#\s*)(${NUMBER}(?:${JOIN}${NUMBER})*)`,
  'giu',
);
const NUMBER_IN_LIST = new RegExp(NUMBER, 'gu');

/**
 * The comment cut into text and step references. With `stepCount`, a number
 * outside 1…stepCount stays text (the trail has no such step).
 */
export function commentPieces(comment: string, stepCount?: number): CommentPiece[] {
  const pieces: CommentPiece[] = [];
  const pushText = (text: string) => {
    if (!text) return;
    const last = pieces.at(-1);
    if (last?.kind === 'text') pieces[pieces.length - 1] = { kind: 'text', text: last.text + text };
    else pieces.push({ kind: 'text', text });
  };
  const known = (n: number) =>
    n >= 1 && (stepCount === undefined || (Number.isInteger(stepCount) && n <= stepCount));

  let at = 0;
  for (const match of comment.matchAll(REFERENCE)) {
    const [whole, word = '', gap = '', list = ''] = match;
    const start = match.index;
    pushText(comment.slice(at, start));
    at = start + whole.length;
    const numbers = [...list.matchAll(NUMBER_IN_LIST)];
    if (numbers.length === 1) {
      const n = Number(list);
      if (known(n)) pieces.push({ kind: 'step', text: whole, step: n });
      else pushText(whole);
      continue;
    }
    // Several: the word stays text, each number is its own link.
    pushText(word + gap);
    let inList = 0;
    for (const n of numbers) {
      pushText(list.slice(inList, n.index));
      const value = Number(n[0]);
      if (known(value)) pieces.push({ kind: 'step', text: n[0], step: value });
      else pushText(n[0]);
      inList = n.index + n[0].length;
    }
    pushText(list.slice(inList));
  }
  pushText(comment.slice(at));
  return pieces;
}

/** The distinct step numbers a comment refers to, in order of first mention. */
export function stepsReferred(comment: string, stepCount?: number): number[] {
  const seen = new Set<number>();
  for (const piece of commentPieces(comment, stepCount))
    if (piece.kind === 'step') seen.add(piece.step);
  return [...seen];
}
