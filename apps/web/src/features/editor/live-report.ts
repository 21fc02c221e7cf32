import { CalcInputError, screen, type InputIssue, type Report } from '@hoopline/calc';

export type Evaluation =
  | { readonly ok: true; readonly report: Report }
  | { readonly ok: false; readonly issues: readonly InputIssue[] };

/**
 * Runs the engine on the inputs as they stand. Bad input gives the engine's
 * issues, each naming its field; anything else the engine throws is a bug in
 * it and is reported as one issue rather than breaking the page.
 */
export function evaluate(raw: unknown): Evaluation {
  try {
    return { ok: true, report: screen(raw) };
  } catch (error) {
    if (error instanceof CalcInputError) return { ok: false, issues: error.issues };
    return {
      ok: false,
      issues: [
        {
          path: '',
          message: `the engine could not compute this input: ${error instanceof Error ? error.message : String(error)}`,
        },
      ],
    };
  }
}

/** Issues keyed by path; the first message for a path wins. */
export function issuesByPath(issues: readonly InputIssue[]): Map<string, string> {
  const map = new Map<string, string>();
  for (const issue of issues) if (!map.has(issue.path)) map.set(issue.path, issue.message);
  return map;
}

/** The server's 400 `fields` name component inputs as `inputs.<path>`. */
export function serverInputIssues(
  fields: readonly { path: string; message: string }[],
): InputIssue[] {
  return fields
    .filter((f) => f.path === 'inputs' || f.path.startsWith('inputs.'))
    .map((f) => ({
      path: f.path === 'inputs' ? '' : f.path.slice('inputs.'.length),
      message: f.message,
    }));
}
