import { CAUTIONS, type Caution } from '@hoopline/calc';

/**
 * The screening caution (PRODUCT.md, "Cautions that must appear"). Always
 * rendered open on every result view: there is no toggle that hides it.
 */
export function ScreeningCaution({ caution = CAUTIONS['screening-only'] }: { caution?: Caution }) {
  return (
    <aside
      aria-label="Screening caution"
      className="rounded-md border border-warn border-l-4 bg-warn-soft px-3 py-2 text-sm text-ink"
    >
      <p className="font-semibold text-warn">{caution.title}</p>
      <p className="mt-0.5">{caution.text}</p>
    </aside>
  );
}
