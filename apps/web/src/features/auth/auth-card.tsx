import type { ReactNode } from 'react';
import { CAUTIONS } from '@hoopline/calc';
import { HealthIndicator } from '../../components/health-indicator';
import { ThemeSwitch } from '../../components/theme-switch';

/** The frame of the signed-out pages. */
export function AuthCard({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center justify-center px-4 py-10">
      <main id="main" className="w-full max-w-sm">
        <p className="mb-6 flex items-center justify-center gap-2 text-lg font-semibold tracking-tight">
          <img src="/favicon.svg" alt="" className="h-6 w-6" />
          Hoopline
        </p>
        <div className="rounded-md border border-line bg-panel p-5 shadow-sm">
          <h1 className="mb-4 text-lg font-semibold">{title}</h1>
          {children}
        </div>
        <p className="mt-6 text-center text-xs text-muted">{CAUTIONS['screening-only'].title}.</p>
      </main>
      <div className="mt-4 flex flex-col items-center gap-3">
        <HealthIndicator />
        <ThemeSwitch />
      </div>
    </div>
  );
}
