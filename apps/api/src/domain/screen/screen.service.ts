import {
  CalcInputError,
  readCsvCases,
  screen,
  screenMany,
  type Report,
  type ScreenOutcome,
} from '@hoopline/calc';
import { screenBatchBody } from '@hoopline/contract';
import { validationFailed } from '../../http/errors';
import { fieldErrors } from '../../http/validate';
import { inputIssues } from '../revisions/revision-content';

/** The most component rows one CSV request screens. */
const MAX_CSV_ROWS = 500;

/**
 * Screening without saving anything (POST /screen): one calc input, a batch
 * of them, or a CSV table (dotted headers, one component per row). Stateless:
 * it runs the engine and reads no table. A bad request is a field-named 400;
 * in a batch or a table each case answers for itself (`ok: false` with its
 * issues), so one bad row does not hide the others' reports.
 */
export class ScreenService {
  /** One calc input: its report, or the engine's issues as 400 fields at their own paths. */
  screenOne(input: unknown): Report {
    try {
      return screen(input);
    } catch (error) {
      if (error instanceof CalcInputError) throw inputIssues(error, '');
      throw error;
    }
  }

  /** `{ cases: [...] }`: an outcome per case, in order. */
  screenBatch(body: unknown): { results: ScreenOutcome[] } {
    const parsed = screenBatchBody.safeParse(body);
    if (!parsed.success) throw validationFailed(fieldErrors(parsed.error));
    return { results: screenMany(parsed.data.cases) };
  }

  /** A CSV table: an outcome per component row, with the row's line number. */
  screenCsv(text: string): { results: Array<{ row: number } & ScreenOutcome> } {
    if (text.includes('\u0000')) {
      throw validationFailed([{ path: 'csv', message: 'must not contain NUL characters' }]);
    }
    let rows;
    try {
      rows = readCsvCases(text);
    } catch (error) {
      if (error instanceof CalcInputError) throw inputIssues(error, '');
      throw error;
    }
    if (rows.length === 0)
      throw validationFailed([{ path: 'csv', message: 'has no component rows' }]);
    if (rows.length > MAX_CSV_ROWS) {
      throw validationFailed([{ path: 'csv', message: 'at most 500 rows in one request' }]);
    }
    const outcomes = screenMany(rows.map((r) => r.input));
    return { results: outcomes.map((outcome, i) => ({ row: rows[i]!.row, ...outcome })) };
  }
}
