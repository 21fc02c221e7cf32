import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { NavLink, Outlet, useLocation, useNavigate } from 'react-router-dom';
import { onSessionLost } from '../api/client';
import { useMe, useSignOut, useUpdateMe } from '../api/session';
import { UNIT_SYSTEMS } from '@hoopline/contract';
import { useCheckQueue, useReturned } from '../api/work';
import { ProgressBar } from '../components/progress-bar';
import { ThemeSwitch } from '../components/theme-switch';
import {
  UnitSystemProvider,
  clearSessionUnits,
  useChooseUnitSystem,
  useUnitSystem,
} from '../lib/unit-system';
import { signInPath } from './guards';

function navClass({ isActive }: { isActive: boolean }) {
  return `rounded px-2.5 py-1.5 text-sm ${
    isActive ? 'bg-accent-soft font-medium text-ink' : 'text-muted hover:bg-sunken hover:text-ink'
  }`;
}

function QueueCount() {
  const queue = useCheckQueue();
  const total = queue.data?.total ?? 0;
  if (total === 0) return null;
  return (
    <span className="num ml-1 rounded-full bg-accent px-1.5 text-xs text-accent-ink">
      {total}
      <span className="sr-only"> awaiting</span>
    </span>
  );
}

function ReturnedCount() {
  const returned = useReturned();
  const total = returned.data?.total ?? 0;
  if (total === 0) return null;
  return (
    <span className="num ml-1 rounded-full bg-accent px-1.5 text-xs text-accent-ink">
      {total}
      <span className="sr-only"> returned</span>
    </span>
  );
}

/**
 * The display units of this session (lib/unit-system: an explicit choice
 * here overrides a project's own units for the session), also saved as the
 * person's own setting (PATCH /api/me) for the pages outside projects.
 */
function UnitSwitch() {
  const update = useUpdateMe();
  const shown = useUnitSystem();
  const choose = useChooseUnitSystem();
  return (
    <fieldset className="flex items-center gap-1 text-xs text-muted">
      <legend className="sr-only">Display units</legend>
      <span aria-hidden="true">Units</span>
      {UNIT_SYSTEMS.map((s) => (
        <label
          key={s}
          className={`cursor-pointer rounded border px-1.5 py-0.5 ${
            shown === s ? 'border-accent bg-accent-soft text-ink' : 'border-line'
          } has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-focus`}
        >
          <input
            type="radio"
            name="unit-system"
            value={s}
            checked={shown === s}
            onChange={() => {
              choose(s);
              update.mutate({ unitSystem: s });
            }}
            className="sr-only"
          />
          {s === 'si' ? 'SI' : 'US'}
        </label>
      ))}
    </fieldset>
  );
}

/**
 * The signed-in shell: skip link, navigation by role, display settings, the
 * page. Below the md breakpoint (a phone, a narrow window) the navigation and
 * settings fold behind a Menu button; the menu closes when the page changes.
 */
export function AppLayout() {
  const me = useMe();
  const navigate = useNavigate();
  const { pathname } = useLocation();
  // Open on the page where it was opened: a navigation closes it without an effect.
  const [menuOpenAt, setMenuOpenAt] = useState<string | null>(null);
  const menuOpen = menuOpenAt === pathname;
  const signOut = useSignOut();
  const client = useQueryClient();
  const isChecker = me.memberships.some((m) => m.role === 'checker');
  const isDesigner = me.memberships.some((m) => m.role === 'designer');

  useEffect(
    () =>
      onSessionLost(() => {
        // Forget the signed-out user's data first, or sign-in would see a cached session and bounce back.
        client.clear();
        navigate(signInPath(`${window.location.pathname}${window.location.search}`), {
          replace: true,
        });
      }),
    [navigate, client],
  );

  return (
    <UnitSystemProvider system={me.user.unitSystem} vacuumUnit={me.user.vacuumUnit}>
      <a
        href="#main"
        className="sr-only z-50 rounded bg-accent px-3 py-2 text-accent-ink focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      <ProgressBar />
      <header className="border-b border-line bg-panel">
        <div className="mx-auto flex max-w-[1440px] flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2">
          <NavLink to="/projects" className="flex items-center gap-2 font-semibold tracking-tight">
            <img src="/favicon.svg" alt="" className="h-5 w-5" />
            Hoopline
          </NavLink>
          <button
            type="button"
            aria-expanded={menuOpen}
            aria-controls="app-menu"
            className="ml-auto inline-flex items-center gap-1.5 rounded border border-line px-2.5 py-1 text-sm hover:bg-sunken md:hidden"
            onClick={() => setMenuOpenAt(menuOpen ? null : pathname)}
          >
            <svg aria-hidden="true" width="14" height="12" viewBox="0 0 14 12">
              {menuOpen ? (
                <path d="M2 1 L12 11 M12 1 L2 11" className="stroke-ink" strokeWidth="1.6" />
              ) : (
                <path
                  d="M1 1.5 H13 M1 6 H13 M1 10.5 H13"
                  className="stroke-ink"
                  strokeWidth="1.6"
                />
              )}
            </svg>
            Menu
          </button>
          <div
            id="app-menu"
            className={`${menuOpen ? 'flex' : 'hidden'} w-full flex-col gap-2 pb-1 md:flex md:w-auto md:flex-1 md:flex-row md:flex-wrap md:items-center md:gap-x-4 md:pb-0`}
          >
            <nav
              aria-label="Main"
              className="flex flex-col gap-1 md:flex-row md:flex-wrap md:items-center"
            >
              <NavLink to="/projects" className={navClass}>
                Projects
              </NavLink>
              {isChecker ? (
                <NavLink to="/check-queue" className={navClass}>
                  Check queue
                  <QueueCount />
                </NavLink>
              ) : null}
              {isDesigner ? (
                <NavLink to="/returned" className={navClass}>
                  Returned to me
                  <ReturnedCount />
                </NavLink>
              ) : null}
              <NavLink to="/issued" className={navClass}>
                Issued
              </NavLink>
              {me.user.isAdmin ? (
                <>
                  <NavLink to="/people" className={navClass}>
                    People
                  </NavLink>
                  <NavLink to="/audit-log" className={navClass}>
                    Audit log
                  </NavLink>
                </>
              ) : null}
            </nav>
            <div className="flex flex-wrap items-center gap-3 border-t border-line pt-2 md:ml-auto md:border-t-0 md:pt-0">
              <UnitSwitch />
              <ThemeSwitch />
              <NavLink to="/account" className={navClass}>
                {me.user.name}
              </NavLink>
              <button
                type="button"
                className="rounded px-2 py-1 text-sm text-muted hover:bg-sunken hover:text-ink"
                onClick={() => {
                  clearSessionUnits();
                  signOut.mutate(undefined, {
                    onSettled: () => navigate('/sign-in', { replace: true }),
                  });
                }}
              >
                Sign out
              </button>
            </div>
          </div>
        </div>
      </header>
      <main
        id="main"
        tabIndex={-1}
        className="mx-auto max-w-[1440px] min-w-0 px-3 py-5 outline-none sm:px-4"
      >
        <Outlet />
      </main>
    </UnitSystemProvider>
  );
}
