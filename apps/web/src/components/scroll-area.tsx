import type { ReactNode } from 'react';

/**
 * A horizontally scrolling box for a wide table (the trail on a tablet, any
 * table on a phone): it takes focus so a keyboard can scroll it, and is named
 * for screen readers. It is the containing block of what is positioned inside
 * it (the `sr-only` texts of its cells): without `relative` those are placed
 * against the page and widen it, so the page scrolled sideways after all.
 */
export function ScrollArea({
  label,
  children,
  className = '',
  framed = true,
}: {
  label: string;
  children: ReactNode;
  className?: string;
  /** A border and panel of its own; false inside a box that has them. */
  framed?: boolean;
}) {
  return (
    <div
      role="region"
      aria-label={label}
      tabIndex={0}
      className={`relative max-w-full overflow-x-auto ${framed ? 'rounded-md border border-line bg-panel' : ''} ${className}`}
    >
      {children}
    </div>
  );
}
