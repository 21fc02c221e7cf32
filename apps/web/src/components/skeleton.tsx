/** Grey placeholders on first load, so a page never flashes blank. */
export function Skeleton({ className = 'h-4 w-full' }: { className?: string }) {
  return (
    <span aria-hidden="true" className={`block animate-pulse rounded bg-sunken ${className}`} />
  );
}

export function TableSkeleton({ rows = 6, label = 'Loading' }: { rows?: number; label?: string }) {
  return (
    <div role="status" aria-label={label} className="rounded-md border border-line bg-panel p-3">
      <Skeleton className="mb-3 h-4 w-1/3" />
      {Array.from({ length: rows }, (_, i) => (
        <Skeleton key={i} className="mb-2 h-3.5 w-full" />
      ))}
    </div>
  );
}

export function PageSkeleton({ label = 'Loading' }: { label?: string }) {
  return (
    <div role="status" aria-label={label} className="space-y-4">
      <Skeleton className="h-7 w-64" />
      <Skeleton className="h-4 w-96" />
      <div className="grid grid-cols-2 gap-4">
        <Skeleton className="h-48 w-full" />
        <Skeleton className="h-48 w-full" />
      </div>
    </div>
  );
}
