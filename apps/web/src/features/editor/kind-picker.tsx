import { findMethod, type ComponentKind } from '@hoopline/calc';
import { useState } from 'react';
import { Button } from '../../components/button';
import { KIND_BLURB, KIND_ORDER } from '../../lib/kinds';
import { kindName } from '@hoopline/present';
import { engineHasKind } from './kind-forms';

/**
 * Kinds as radio buttons (arrow keys move between them); a kind this engine
 * lacks is shown disabled, with why. Once a kind is picked the list folds to
 * one line, so the workbench starts near the top of the page.
 */
export function KindPicker({
  value,
  onChange,
}: {
  value: ComponentKind | null;
  onChange: (kind: ComponentKind) => void;
}) {
  const [open, setOpen] = useState(value === null);
  if (value !== null && !open) {
    return (
      <div className="flex flex-wrap items-center gap-3 rounded-md border border-line bg-panel px-3 py-2">
        <span className="text-sm">
          Kind: <strong>{kindName(value)}</strong>
        </span>
        <span className="hidden text-xs text-muted md:inline">{KIND_BLURB[value]}</span>
        <Button size="sm" variant="ghost" onClick={() => setOpen(true)}>
          Change kind
        </Button>
      </div>
    );
  }
  return (
    <fieldset>
      <legend className="mb-2 text-sm font-semibold">What are you screening?</legend>
      <div className="grid gap-2 sm:grid-cols-2 xl:grid-cols-4">
        {KIND_ORDER.map((kind) => {
          const available = engineHasKind(kind);
          const id = `kind-${kind}`;
          return (
            <label
              key={kind}
              htmlFor={id}
              title={findMethod(kind)?.description}
              className={`flex cursor-pointer gap-2 rounded-md border p-2.5 ${
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
                onChange={() => {
                  onChange(kind);
                  setOpen(false);
                }}
                className="mt-0.5 accent-accent"
                aria-describedby={`${id}-description`}
              />
              <span>
                <span className="block text-sm font-medium">{kindName(kind)}</span>
                <span id={`${id}-description`} className="block text-xs text-muted">
                  {available ? KIND_BLURB[kind] : 'Not in this engine version yet.'}
                </span>
              </span>
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
