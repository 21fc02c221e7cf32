import { formatPercent as percent } from '@hoopline/present';

/**
 * Demand over capacity as a bar with its value in text. The bar is drawn to
 * 150 % at most (a longer one says nothing more); the text always carries the
 * number and whether it passes, so colour is never the only signal.
 */
export function UtilisationBar({
  utilisation,
  pass,
  label,
  stale = false,
}: {
  utilisation: number;
  pass: boolean;
  label: string;
  /** The inputs changed and cannot be read: the figure is an old one, so no pass or fail is said. */
  stale?: boolean;
}) {
  const shown = Math.max(0, Math.min(utilisation, 1.5));
  const width = (shown / 1.5) * 100;
  const tone = stale
    ? 'bg-line-strong'
    : !pass
      ? 'bg-fail'
      : utilisation > 0.9
        ? 'bg-warn'
        : 'bg-pass';
  return (
    <div className="flex items-center gap-2">
      <div
        role="meter"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={150}
        aria-valuenow={Math.round(shown * 1000) / 10}
        aria-valuetext={`${percent(utilisation)}, ${stale ? 'not current' : pass ? 'passes' : 'fails'}`}
        className="relative h-2.5 w-32 shrink-0 overflow-hidden rounded-sm bg-sunken"
      >
        <span className={`absolute inset-y-0 left-0 ${tone}`} style={{ width: `${width}%` }} />
        {/* The 100 % line: two thirds of the way along. */}
        <span
          aria-hidden="true"
          className="absolute inset-y-0 w-px bg-ink"
          style={{ left: `${(1 / 1.5) * 100}%` }}
        />
      </div>
      <span className="num w-16 text-right text-xs font-medium">{percent(utilisation)}</span>
      {stale ? (
        <span className="text-xs text-muted">not current</span>
      ) : (
        <span className={`text-xs font-medium ${pass ? 'text-pass' : 'text-fail'}`}>
          {pass ? 'Pass' : 'Fail'}
        </span>
      )}
    </div>
  );
}
