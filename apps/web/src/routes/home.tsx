import { HealthIndicator } from '../components/health-indicator';

export function HomeRoute() {
  return (
    <main className="mx-auto max-w-3xl px-6 py-16">
      <h1 className="text-3xl font-semibold tracking-tight text-slate-900 dark:text-slate-50">
        Hoopline
      </h1>
      <p className="mt-2 text-slate-600 dark:text-slate-300">
        Screening of doors, covers, windows and shells under a pressure difference.
      </p>
      <div className="mt-6">
        <HealthIndicator />
      </div>
      <p className="mt-10 border-l-4 border-amber-500 pl-3 text-sm text-slate-700 dark:text-slate-300">
        Screening only, not a code calculation. Final design, fabrication and testing follow the
        applicable pressure-equipment code and local regulations, under a qualified engineer.
      </p>
    </main>
  );
}
