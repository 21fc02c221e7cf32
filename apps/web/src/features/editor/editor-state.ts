import { useCallback, useReducer } from 'react';
import { setIn, type Raw } from './paths';

/**
 * The editor's state is the component input itself, exactly what is saved,
 * plus the text of number fields while they are typed ("1." must stay "1.").
 *
 * Why a reducer and not formik: the engine is the validator, and one
 * `screen()` call per change yields both the report and every field's issue;
 * formik would run its own validation pass beside it, and keeps nested error
 * objects where the engine names issues by dotted path.
 */
export interface EditorState {
  readonly raw: Raw;
  readonly texts: Readonly<Record<string, string>>;
  /** Bumped on every change, so a save can tell whether the inputs moved on meanwhile. */
  readonly edits: number;
}

type Action =
  | { readonly type: 'set'; readonly path: string; readonly value: unknown }
  | { readonly type: 'number'; readonly path: string; readonly text: string }
  | { readonly type: 'replace'; readonly raw: Raw };

/** Text typed into a number field → the value the engine gets: a number when it reads as one. */
export function numberFromText(text: string): number | string | undefined {
  const trimmed = text.trim();
  if (trimmed === '') return undefined;
  const n = Number(trimmed);
  return Number.isFinite(n) ? n : trimmed;
}

export function editorReducer(state: EditorState, action: Action): EditorState {
  switch (action.type) {
    case 'set': {
      const value = action.value === '' ? undefined : action.value;
      return { ...state, raw: setIn(state.raw, action.path, value), edits: state.edits + 1 };
    }
    case 'number':
      return {
        raw: setIn(state.raw, action.path, numberFromText(action.text)),
        texts: { ...state.texts, [action.path]: action.text },
        edits: state.edits + 1,
      };
    case 'replace':
      return { raw: action.raw, texts: {}, edits: state.edits + 1 };
  }
}

export function useEditorState(initial: Raw) {
  const [state, dispatch] = useReducer(editorReducer, { raw: initial, texts: {}, edits: 0 });
  const set = useCallback(
    (path: string, value: unknown) => dispatch({ type: 'set', path, value }),
    [],
  );
  const setNumber = useCallback(
    (path: string, text: string) => dispatch({ type: 'number', path, text }),
    [],
  );
  const replace = useCallback((raw: Raw) => dispatch({ type: 'replace', raw }), []);
  return { state, set, setNumber, replace };
}

export type EditorApi = ReturnType<typeof useEditorState>;
