import { findMethod, type ComponentKind } from '@hoopline/calc';
import { KIND_LABEL, KIND_ORDER } from '../../lib/kinds';
import { engineHasKind } from './kind-forms';

/** Kinds as radio buttons (arrow keys move between them); kinds this engine lacks are shown, disabled, with why. */
export function KindPicker({
  value,
  onChange,
}: {
  value: ComponentKind | null;
  onChange: (kind: ComponentKind) => void;
}) {
  return (
    <fieldset>
      <legend className="mb-2 text-sm font-semibold">What are you screening?</legend>
      <div className="grid gap-2 sm:grid-cols-2 xl:grid-cols-3">
        {KIND_ORDER.map((kind) => {
          const available = engineHasKind(kind);
          const method = findMethod(kind);
          const id = `kind-${kind}`;
          return (
            <label
              key={kind}
              htmlFor={id}
              className={`flex cursor-pointer gap-2 rounded-md border p-3 ${
                value === kind
                  ? 'border-accent bg-accent-soft'
                  : 'border-line bg-panel hover:bg-sunken'
              } ${available ? '' : 'cursor-not-allowed opacity-60'} has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-focus`}
            >
              <input
                id={id}
                type="radio"
                name="kind"
                value={kind}
                checked={value === kind}
                disabled={!available}
                onChange={() => onChange(kind)}
                className="mt-0.5 accent-accent"
                aria-describedby={`${id}-description`}
              />
              <span>
                <span className="block text-sm font-medium">{KIND_LABEL[kind]}</span>
                <span id={`${id}-description`} className="block text-xs text-muted">
                  {available
                    ? method?.description
                    : 'Not in this engine version yet: it arrives with a later release of the screening engine.'}
                </span>
              </span>
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
