import { useHealth } from '../api/health';

/** A small status light: is the server up and can it reach its database? */
export function HealthIndicator() {
  const health = useHealth();
  let tone = 'bg-slate-400';
  let text = 'Checking server…';
  if (health.isError) {
    tone = 'bg-red-600';
    text = 'Server unreachable';
  } else if (health.data) {
    const ok = health.data.database.reachable;
    tone = ok ? 'bg-emerald-600' : 'bg-amber-500';
    text = ok
      ? `Server and database online (engine ${health.data.engine.version})`
      : 'Server online, database unreachable';
  }
  return (
    <p role="status" aria-live="polite" className="flex items-center gap-2 text-xs text-muted">
      <span aria-hidden="true" className={`inline-block h-2.5 w-2.5 rounded-full ${tone}`} />
      <span>{text}</span>
    </p>
  );
}
