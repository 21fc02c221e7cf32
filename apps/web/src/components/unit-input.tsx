import {
  findUnit,
  loadCaseSchema,
  parseQuantity,
  QuantityParseError,
  SI_UNIT,
  type Dimension,
} from '@hoopline/calc';
import { useId, type InputHTMLAttributes } from 'react';
import type { UnitSystem } from '@hoopline/contract';
import { displayUnitSymbol as displayUnitFor, formatSignificant, show } from '@hoopline/present';
import { describedBy, FieldShell, INPUT_CLASS } from './field';

/**
 * What a quantity field holds: a plain dimension, a load-case pressure
 * ("full vacuum", "10 torr", "-0.9 bar(g)", "ambient"), or a differential
 * magnitude ("0.2 bar").
 */
export type QuantityKind = Dimension | 'load-pressure' | 'differential';

export type Reading =
  | { readonly state: 'empty' }
  | { readonly state: 'ok'; readonly text: string; readonly si: number | null }
  | { readonly state: 'error'; readonly message: string };

function inUnit(si: number, symbol: string): string {
  const unit = findUnit(symbol);
  if (!unit) return `${formatSignificant(si)} ${symbol}`;
  return show(si, SI_UNIT[unit.dimension], 'si', { unit: unit.symbol });
}

/** The reading line for a typed value: `12.7 mm = 0.0127 m`, in the reader's display unit and SI. */
function describeSi(
  si: number,
  dimension: Dimension,
  typedUnit: string,
  system: UnitSystem,
): string {
  const display = displayUnitFor(dimension, si, system);
  const siText = inUnit(si, SI_UNIT[dimension]);
  if (display === typedUnit || display === SI_UNIT[dimension]) return siText;
  return `${inUnit(si, display)} = ${siText}`;
}

/**
 * Reads what was typed with the engine's own parsers (parseQuantity, the
 * load-case schema), so the reading and the engine never disagree.
 */
export function readQuantity(text: string, kind: QuantityKind, system: UnitSystem): Reading {
  if (text.trim() === '') return { state: 'empty' };
  if (kind === 'load-pressure') {
    const parsed = loadCaseSchema.safeParse({ name: 'reading', internal: text });
    if (!parsed.success) {
      return { state: 'error', message: parsed.error.issues[0]?.message ?? 'cannot be read' };
    }
    const spec = parsed.data.internal!;
    if (spec.kind === 'ambient')
      return { state: 'ok', text: 'the site’s ambient pressure', si: null };
    const suffix = spec.reference === 'gauge' ? 'gauge' : 'absolute';
    const display = displayUnitFor('pressure', spec.pascals, system);
    const main = `${inUnit(spec.pascals, display)} ${suffix}`;
    return {
      state: 'ok',
      text: display === 'Pa' ? main : `${main} = ${inUnit(spec.pascals, 'Pa')}`,
      si: spec.pascals,
    };
  }
  if (kind === 'differential') {
    const parsed = loadCaseSchema.safeParse({
      name: 'reading',
      differential: text,
      direction: 'external-over',
    });
    if (!parsed.success) {
      return { state: 'error', message: parsed.error.issues[0]?.message ?? 'cannot be read' };
    }
    const si = parsed.data.differential!;
    return { state: 'ok', text: `${describeSi(si, 'pressure', '', system)} difference`, si };
  }
  try {
    const q = parseQuantity(text, { dimension: kind });
    return { state: 'ok', text: describeSi(q.si, kind, q.unit, system), si: q.si };
  } catch (error) {
    return {
      state: 'error',
      message: error instanceof QuantityParseError ? error.message : 'cannot be read',
    };
  }
}

export interface UnitInputProps extends Omit<
  InputHTMLAttributes<HTMLInputElement>,
  'value' | 'onChange' | 'id'
> {
  readonly label: string;
  readonly value: string;
  readonly onValueChange: (text: string) => void;
  readonly kind: QuantityKind;
  readonly system: UnitSystem;
  /** The engine's message for this field (from CalcInputError issues or the server's 400). */
  readonly error?: string | undefined;
  readonly hint?: string;
  readonly id?: string;
}

/**
 * A text field for a physical quantity: accepts "12 mm", "0.5 in", "10 torr",
 * "-0.9 bar(g)"; as the user types it shows how the engine reads the value,
 * or why it cannot.
 */
export function UnitInput({
  label,
  value,
  onValueChange,
  kind,
  system,
  error,
  hint,
  id,
  className,
  ...rest
}: UnitInputProps) {
  const auto = useId();
  const fieldId = id ?? auto;
  const reading = readQuantity(value, kind, system);
  // The engine's message names the rule (range, relation to other fields); the parser's only the syntax.
  const shownError = error ?? (reading.state === 'error' ? reading.message : undefined);
  const readingId = `${fieldId}-reading`;
  return (
    <FieldShell
      id={fieldId}
      label={label}
      hint={hint}
      error={shownError}
      className={className ?? ''}
    >
      <input
        id={fieldId}
        type="text"
        inputMode="text"
        autoComplete="off"
        spellCheck={false}
        className={`${INPUT_CLASS} num font-mono`}
        value={value}
        onChange={(event) => onValueChange(event.target.value)}
        aria-invalid={shownError ? true : undefined}
        aria-describedby={
          [describedBy(fieldId, hint, shownError), reading.state === 'ok' ? readingId : undefined]
            .filter(Boolean)
            .join(' ') || undefined
        }
        {...rest}
      />
      {reading.state === 'ok' && !shownError ? (
        <p id={readingId} className="num text-xs text-muted" aria-live="polite">
          <span className="sr-only">Reads as </span>
          <span aria-hidden="true">= </span>
          {reading.text}
        </p>
      ) : null}
    </FieldShell>
  );
}
