import type { UnitSystem } from '@hoopline/contract';
import { Button } from '../../components/button';
import { COMMON_VOCABULARY } from '@hoopline/calc';
import { SelectField, TextField } from '../../components/field';
import { UnitInput } from '../../components/unit-input';
import type { EditorApi } from './editor-state';
import { fieldId, numberText, quantityText } from './fields';
import type { Raw } from './paths';

const MAX_CASES = 20;

/** The case temperature's words, from the engine's vocabulary. */
const CASE_TEMPERATURE = COMMON_VOCABULARY['loadCases.*.temperature']!;

/**
 * The component's load cases: each either the pressures inside and outside
 * (blank = the site's ambient), or a differential with its direction, an
 * optional load factor (e.g. 1.3 for a proof test), and an optional
 * temperature where the case differs from the component's design temperature.
 */
export function LoadCasesField({
  editor,
  issues,
  system,
}: {
  editor: EditorApi;
  issues: ReadonlyMap<string, string>;
  system: UnitSystem;
}) {
  const cases = (
    Array.isArray(editor.state.raw['loadCases']) ? editor.state.raw['loadCases'] : []
  ) as Raw[];
  const listError = issues.get('loadCases');
  const replaceCases = (next: Raw[]) => editor.set('loadCases', next);
  return (
    <div className="flex flex-col gap-3">
      {listError ? (
        <p role="alert" className="text-xs font-medium text-fail">
          Load cases: {listError}
        </p>
      ) : null}
      {cases.map((c, i) => {
        const base = `loadCases.${i}`;
        const differential = c['differential'] !== undefined || c['direction'] !== undefined;
        const caseError = issues.get(base);
        return (
          <fieldset key={i} className="rounded border border-line p-2.5">
            <legend className="px-1 text-xs font-medium">Load case {i + 1}</legend>
            {caseError ? <p className="mb-2 text-xs font-medium text-fail">{caseError}</p> : null}
            <div className="grid gap-2.5 sm:grid-cols-2">
              <TextField
                id={fieldId(`${base}.name`)}
                label="Name"
                value={typeof c['name'] === 'string' ? c['name'] : ''}
                onChange={(event) => editor.set(`${base}.name`, event.target.value)}
                error={issues.get(`${base}.name`)}
                className="sm:col-span-2"
              />
              <SelectField
                id={fieldId(`${base}.mode`)}
                label="Given as"
                value={differential ? 'differential' : 'pressures'}
                onChange={(event) => {
                  const name = c['name'];
                  const factor = c['factor'];
                  const temperature = c['temperature'];
                  const next: Raw =
                    event.target.value === 'differential'
                      ? { name, differential: '', direction: 'external-over' }
                      : { name, internal: '' };
                  if (factor !== undefined) next['factor'] = factor;
                  if (temperature !== undefined) next['temperature'] = temperature;
                  if (next['differential'] === '') delete next['differential'];
                  if (next['internal'] === '') delete next['internal'];
                  editor.set(base, next);
                }}
              >
                <option value="pressures">Pressures inside and outside</option>
                <option value="differential">A pressure difference and its direction</option>
              </SelectField>
              <TextField
                id={fieldId(`${base}.factor`)}
                label="Load factor (optional)"
                inputMode="decimal"
                className="num"
                hint="Multiplies the difference, e.g. 1.3."
                value={numberText(editor, `${base}.factor`)}
                onChange={(event) => editor.setNumber(`${base}.factor`, event.target.value)}
                error={issues.get(`${base}.factor`)}
              />
              {differential ? (
                <>
                  <UnitInput
                    id={fieldId(`${base}.differential`)}
                    label="Pressure difference"
                    kind="differential"
                    system={system}
                    hint='e.g. "1 atm" or "0.2 bar".'
                    value={quantityText(c['differential'], 'differential')}
                    onValueChange={(text) => editor.set(`${base}.differential`, text)}
                    error={issues.get(`${base}.differential`)}
                  />
                  <SelectField
                    id={fieldId(`${base}.direction`)}
                    label="Higher pressure"
                    value={typeof c['direction'] === 'string' ? c['direction'] : 'external-over'}
                    onChange={(event) => editor.set(`${base}.direction`, event.target.value)}
                    error={issues.get(`${base}.direction`)}
                  >
                    <option value="external-over">Outside (vacuum inside)</option>
                    <option value="internal-over">Inside (over-pressure)</option>
                  </SelectField>
                </>
              ) : (
                <>
                  <UnitInput
                    id={fieldId(`${base}.internal`)}
                    label="Inside pressure"
                    kind="load-pressure"
                    system={system}
                    hint='"full vacuum", "10 torr", "0.2 bar(g)"; blank = ambient.'
                    value={quantityText(c['internal'], 'load-pressure')}
                    onValueChange={(text) => editor.set(`${base}.internal`, text)}
                    error={issues.get(`${base}.internal`)}
                  />
                  <UnitInput
                    id={fieldId(`${base}.external`)}
                    label="Outside pressure"
                    kind="load-pressure"
                    system={system}
                    hint="Blank = the site's ambient pressure."
                    value={quantityText(c['external'], 'load-pressure')}
                    onValueChange={(text) => editor.set(`${base}.external`, text)}
                    error={issues.get(`${base}.external`)}
                  />
                </>
              )}
              <UnitInput
                id={fieldId(`${base}.temperature`)}
                label={`${CASE_TEMPERATURE.label} (optional)`}
                kind="temperature"
                system={system}
                {...(CASE_TEMPERATURE.hint ? { hint: CASE_TEMPERATURE.hint } : {})}
                value={quantityText(c['temperature'], 'temperature')}
                onValueChange={(text) => editor.set(`${base}.temperature`, text)}
                error={issues.get(`${base}.temperature`)}
              />
            </div>
            {cases.length > 1 ? (
              <div className="mt-2 flex justify-end">
                <Button
                  size="sm"
                  variant="ghost"
                  onClick={() => replaceCases(cases.filter((_, j) => j !== i))}
                >
                  Remove load case {i + 1}
                </Button>
              </div>
            ) : null}
          </fieldset>
        );
      })}
      <div>
        <Button
          size="sm"
          disabled={cases.length >= MAX_CASES}
          onClick={() =>
            replaceCases([
              ...cases,
              { name: `Load case ${cases.length + 1}`, internal: 'full vacuum' },
            ])
          }
        >
          Add load case
        </Button>
      </div>
    </div>
  );
}
