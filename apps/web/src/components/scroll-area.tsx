import type { ReactNode } from 'react';

/**
 * A horizontally scrolling box for a wide table (the trail on a tablet): it
 * takes focus so a keyboard can scroll it, and is named for screen readers.
 */
export function ScrollArea({
  label,
  children,
  className = '',
}: {
  label: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <div
      role="region"
      aria-label={label}
      tabIndex={0}
      className={`overflow-x-auto rounded-md border border-line bg-panel ${className}`}
    >
      {children}
    </div>
  );
}
