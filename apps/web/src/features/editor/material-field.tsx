import { customMaterialSchema, findMaterial, isCodeMaterial, MATERIALS } from '@hoopline/calc';
import { useState } from 'react';
import { useAddProjectMaterial, useProjectMaterials } from '../../api/projects';
import type { UnitSystem } from '@hoopline/contract';
import { Button } from '../../components/button';
import { CheckboxField, SelectField, TextField } from '../../components/field';
import { messageFor } from '../../components/server-errors';
import { UnitInput } from '../../components/unit-input';
import { show } from '@hoopline/present';
import type { EditorApi } from './editor-state';
import { fieldId, numberText, quantityText } from './fields';
import { getIn, sameInputs, type Raw } from './paths';

const CUSTOM = '__custom';
const NEW_CUSTOM: Raw = {
  name: 'Custom material',
  elasticModulus: '200 GPa',
  poissonRatio: 0.3,
  strength: '250 MPa',
  strengthBasis: 'yield',
};

/**
 * A built-in material by id, one of the project's custom materials (copied
 * into the input, so a revision never changes when the list does), or a
 * custom material entered here.
 */
export function MaterialField({
  path,
  label,
  editor,
  issues,
  system,
  projectId,
  canSaveToProject,
}: {
  path: string;
  label: string;
  editor: EditorApi;
  issues: ReadonlyMap<string, string>;
  system: UnitSystem;
  projectId: string;
  canSaveToProject: boolean;
}) {
  const value = getIn(editor.state.raw, path);
  const projectMaterials = useProjectMaterials(projectId);
  const addMaterial = useAddProjectMaterial(projectId);
  const [saveMessage, setSaveMessage] = useState<string | null>(null);
  const items = projectMaterials.data?.items ?? [];
  const projectMatch =
    typeof value === 'object' && value !== null
      ? items.find((m) => sameInputs(m.material, value))
      : undefined;
  const selected =
    typeof value === 'string'
      ? value
      : projectMatch
        ? `project:${projectMatch.id}`
        : value
          ? CUSTOM
          : '';
  const custom = typeof value === 'object' && value !== null ? (value as Raw) : null;

  // The union in the engine's schema reports one message for a bad custom material; check it alone for field messages.
  const customIssues = new Map<string, string>();
  if (custom) {
    const checked = customMaterialSchema.safeParse(custom);
    if (!checked.success) {
      for (const issue of checked.error.issues) {
        const key = `${path}.${issue.path.join('.')}`;
        if (!customIssues.has(key)) customIssues.set(key, issue.message);
      }
    }
  }
  const errorFor = (p: string) => customIssues.get(p) ?? issues.get(p);
  const builtIn = typeof value === 'string' ? findMaterial(value) : undefined;

  return (
    <div className="flex flex-col gap-2.5">
      <SelectField
        id={fieldId(path)}
        label={label}
        value={selected}
        error={custom ? undefined : issues.get(path)}
        onChange={(event) => {
          const next = event.target.value;
          setSaveMessage(null);
          if (next === CUSTOM) editor.set(path, { ...(custom ?? NEW_CUSTOM) });
          else if (next.startsWith('project:')) {
            const item = items.find((m) => `project:${m.id}` === next);
            if (item) editor.set(path, structuredClone(item.material));
          } else editor.set(path, next);
        }}
      >
        {selected === '' ? <option value="">Choose a material</option> : null}
        <optgroup label="Built-in">
          {MATERIALS.map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </optgroup>
        {items.length > 0 ? (
          <optgroup label="This project">
            {items.map((m) => (
              <option key={m.id} value={`project:${m.id}`}>
                {m.name}
              </option>
            ))}
          </optgroup>
        ) : null}
        <option value={CUSTOM}>Custom material…</option>
      </SelectField>
      {builtIn ? (
        <p className="num text-xs text-muted">
          E {show(builtIn.elasticModulus, 'Pa', system)} · ν {builtIn.poissonRatio} ·{' '}
          {builtIn.strengthBasis === 'yield'
            ? 'yield'
            : builtIn.strengthBasis === 'tensile'
              ? 'tensile'
              : 'design'}{' '}
          {show(builtIn.strength, 'Pa', system)}
          {isCodeMaterial(builtIn) && builtIn.ultimateStrength !== null
            ? ` · tensile ${show(builtIn.ultimateStrength, 'Pa', system)} (specified minimums; allowable on the project's code basis)`
            : ` (${builtIn.valueBasis.strength}) · design factor ${builtIn.designFactor}`}
          {builtIn.brittle ? ' · brittle' : ''}
          {builtIn.polymer ? ' · polymer' : ''}
        </p>
      ) : null}
      {custom ? (
        <fieldset className="grid gap-2.5 rounded border border-line p-2.5 sm:grid-cols-2">
          <legend className="px-1 text-xs font-medium">Custom material</legend>
          {errorFor(path) && customIssues.size === 0 ? (
            <p className="text-xs font-medium text-fail sm:col-span-2">{issues.get(path)}</p>
          ) : null}
          <TextField
            id={fieldId(`${path}.name`)}
            label="Name"
            className="sm:col-span-2"
            value={typeof custom['name'] === 'string' ? custom['name'] : ''}
            onChange={(event) => editor.set(`${path}.name`, event.target.value)}
            error={errorFor(`${path}.name`)}
          />
          <UnitInput
            id={fieldId(`${path}.elasticModulus`)}
            label="Elastic modulus E"
            kind="pressure"
            system={system}
            value={quantityText(custom['elasticModulus'], 'pressure')}
            onValueChange={(text) => editor.set(`${path}.elasticModulus`, text)}
            error={errorFor(`${path}.elasticModulus`)}
          />
          <TextField
            id={fieldId(`${path}.poissonRatio`)}
            label="Poisson's ratio ν"
            inputMode="decimal"
            className="num"
            value={numberText(editor, `${path}.poissonRatio`)}
            onChange={(event) => editor.setNumber(`${path}.poissonRatio`, event.target.value)}
            error={errorFor(`${path}.poissonRatio`)}
          />
          <UnitInput
            id={fieldId(`${path}.strength`)}
            label="Strength"
            kind="pressure"
            system={system}
            value={quantityText(custom['strength'], 'pressure')}
            onValueChange={(text) => editor.set(`${path}.strength`, text)}
            error={errorFor(`${path}.strength`)}
          />
          <SelectField
            id={fieldId(`${path}.strengthBasis`)}
            label="Strength is"
            value={typeof custom['strengthBasis'] === 'string' ? custom['strengthBasis'] : 'yield'}
            onChange={(event) => editor.set(`${path}.strengthBasis`, event.target.value)}
            error={errorFor(`${path}.strengthBasis`)}
          >
            <option value="yield">Yield strength</option>
            <option value="tensile">Short-term tensile strength</option>
            <option value="design-value">Maker's design value</option>
          </SelectField>
          <UnitInput
            id={fieldId(`${path}.ultimateStrength`)}
            label="Tensile strength (optional)"
            kind="pressure"
            system={system}
            value={quantityText(custom['ultimateStrength'], 'pressure')}
            onValueChange={(text) => editor.set(`${path}.ultimateStrength`, text)}
            error={errorFor(`${path}.ultimateStrength`)}
          />
          <TextField
            id={fieldId(`${path}.designFactor`)}
            label="Design factor (optional)"
            inputMode="decimal"
            className="num"
            value={numberText(editor, `${path}.designFactor`)}
            onChange={(event) => editor.setNumber(`${path}.designFactor`, event.target.value)}
            error={errorFor(`${path}.designFactor`)}
          />
          <div className="flex flex-col gap-1 self-end pb-1.5">
            <CheckboxField
              label="Brittle (glass, acrylic, polycarbonate)"
              checked={custom['brittle'] === true}
              onChange={(event) =>
                editor.set(`${path}.brittle`, event.target.checked ? true : undefined)
              }
            />
            <CheckboxField
              label="Polymer (creeps under sustained load)"
              checked={custom['polymer'] === true}
              onChange={(event) => {
                editor.set(`${path}.polymer`, event.target.checked ? true : undefined);
                if (!event.target.checked) editor.set(`${path}.longTermModulus`, undefined);
              }}
            />
          </div>
          {custom['polymer'] === true ? (
            <UnitInput
              id={fieldId(`${path}.longTermModulus`)}
              label="Long-term modulus (optional)"
              kind="pressure"
              system={system}
              value={quantityText(custom['longTermModulus'], 'pressure')}
              onValueChange={(text) => editor.set(`${path}.longTermModulus`, text)}
              error={errorFor(`${path}.longTermModulus`)}
            />
          ) : null}
          {canSaveToProject && customIssues.size === 0 ? (
            <div className="flex items-center gap-2 sm:col-span-2">
              <Button
                size="sm"
                busy={addMaterial.isPending}
                onClick={() =>
                  addMaterial.mutate(custom, {
                    onSuccess: () => setSaveMessage('Saved to this project’s materials.'),
                    onError: (e) => setSaveMessage(messageFor(e)),
                  })
                }
              >
                Save to project materials
              </Button>
              {saveMessage ? (
                <span role="status" className="text-xs text-muted">
                  {saveMessage}
                </span>
              ) : null}
            </div>
          ) : null}
        </fieldset>
      ) : null}
    </div>
  );
}
