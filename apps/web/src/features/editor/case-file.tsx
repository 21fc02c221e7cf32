import { CalcInputError, casesToCsv, readCsvCases, type ComponentKind } from '@hoopline/calc';
import { kindName } from '@hoopline/present';
import { useId, useState } from 'react';
import { saveBlob } from '../../api/client';
import { Button } from '../../components/button';
import type { Raw } from './paths';

/** A file name from the component's name (or its kind), safe on every file system. */
function fileStem(inputs: Raw, kind: ComponentKind): string {
  const name = typeof inputs['name'] === 'string' && inputs['name'].trim() ? inputs['name'] : kind;
  return name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '') || kind;
}

/**
 * What a case file holds: one component as JSON (an object, or a list of
 * one) or as a CSV table in the CLI's format (`pnpm calc`), first row read.
 * Throws an Error whose message says what is wrong with the file.
 */
export function readCaseFile(text: string, fileName: string): Raw {
  const csv =
    /\.csv$/i.test(fileName) ||
    (!text.trimStart().startsWith('{') && !text.trimStart().startsWith('['));
  if (csv) {
    let rows;
    try {
      rows = readCsvCases(text);
    } catch (error) {
      if (error instanceof CalcInputError)
        throw new Error(error.issues.map((i) => `${i.path}: ${i.message}`).join('; '), {
          cause: error,
        });
      throw error;
    }
    if (rows.length === 0) throw new Error('the table has a header but no component row');
    if (rows.length > 1)
      throw new Error(`the table holds ${rows.length} components; import one at a time`);
    return rows[0]!.input;
  }
  let parsed: unknown;
  try {
    parsed = JSON.parse(text) as unknown;
  } catch (error) {
    throw new Error(`not valid JSON: ${error instanceof Error ? error.message : 'syntax error'}`, {
      cause: error,
    });
  }
  if (Array.isArray(parsed)) {
    if (parsed.length !== 1)
      throw new Error(`the file holds ${parsed.length} components; import one at a time`);
    parsed = parsed[0];
  }
  if (parsed === null || typeof parsed !== 'object' || Array.isArray(parsed))
    throw new Error('the file must hold one component object with a "kind"');
  return parsed as Raw;
}

/**
 * Export the case as the CLI reads it (JSON or CSV, the project's site and
 * design basis in, so `pnpm calc` gives the same report), and import one.
 */
export function CaseFile({
  kind,
  inputs,
  onImport,
}: {
  kind: ComponentKind;
  /** The inputs as screened (with the project's site and design basis). */
  inputs: Raw;
  onImport: (raw: Raw) => void;
}) {
  const fileId = useId();
  const [message, setMessage] = useState<{ text: string; error: boolean } | null>(null);
  const stem = fileStem(inputs, kind);
  return (
    <div
      className="flex flex-col gap-1.5 border-t border-line pt-3"
      role="group"
      aria-label="Case file"
    >
      <p className="text-xs font-semibold tracking-wide text-muted uppercase">Case file</p>
      <div className="flex flex-wrap items-center gap-2">
        <Button
          type="button"
          variant="secondary"
          onClick={() =>
            saveBlob(
              new Blob([`${JSON.stringify(inputs, null, 2)}\n`], {
                type: 'application/json',
              }),
              `${stem}.json`,
            )
          }
        >
          Export JSON
        </Button>
        <Button
          type="button"
          variant="secondary"
          onClick={() =>
            saveBlob(new Blob([casesToCsv([inputs])], { type: 'text/csv' }), `${stem}.csv`)
          }
        >
          Export CSV
        </Button>
        <label htmlFor={fileId} className="cursor-pointer text-sm text-accent underline">
          Import a case…
        </label>
        <input
          id={fileId}
          type="file"
          accept=".json,.csv,application/json,text/csv"
          className="sr-only"
          onChange={async (event) => {
            const file = event.target.files?.[0];
            event.target.value = '';
            if (!file) return;
            try {
              const raw = readCaseFile(await file.text(), file.name);
              if (raw['kind'] !== kind) {
                throw new Error(
                  `it is a case of kind "${String(raw['kind'] ?? 'none')}"; this component is a ${kindName(kind)}`,
                );
              }
              const { site: _site, designBasis: _basis, ...rest } = raw;
              onImport(rest);
              setMessage({
                text: `Imported ${file.name}. The project's site and design basis apply.`,
                error: false,
              });
            } catch (error) {
              setMessage({
                text: `${file.name} was not imported: ${error instanceof Error ? error.message : 'unreadable'}.`,
                error: true,
              });
            }
          }}
        />
      </div>
      {message ? (
        <p
          role={message.error ? 'alert' : 'status'}
          className={`text-xs ${message.error ? 'text-fail' : 'text-muted'}`}
        >
          {message.text}
        </p>
      ) : null}
    </div>
  );
}
