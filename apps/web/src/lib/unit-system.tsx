import {
  createContext,
  useCallback,
  useContext,
  useLayoutEffect,
  useMemo,
  useState,
  type ReactNode,
} from 'react';
import { UNIT_SYSTEMS, type UnitSystem, type VacuumUnit } from '@hoopline/contract';
import type { ReaderUnits } from '@hoopline/present';

/**
 * The units numbers are displayed in. The rule, in order:
 *
 * 1. the person's explicit choice on the header switch, for the rest of the
 *    session (this browser tab: sessionStorage), on every page;
 * 2. on a project's pages (the project, its settings and members, its
 *    components, revisions and comparisons), the project's unit system: it is
 *    the default display for the project's members;
 * 3. elsewhere, the person's own setting (account page, PATCH /api/me).
 *
 * Vacuum levels (absolute pressures below 1 kPa) show in the person's vacuum
 * unit (account page), or the displayed unit system's own (@hoopline/present).
 */
export function displayedUnitSystem(choice: {
  readonly account: UnitSystem;
  readonly project?: UnitSystem | null | undefined;
  readonly session?: UnitSystem | null | undefined;
}): UnitSystem {
  return choice.session ?? choice.project ?? choice.account;
}

/** Where the session's explicit choice is kept (per tab, gone when the tab closes or one signs out). */
export const SESSION_UNITS_KEY = 'hoopline.units.session';

function readSessionChoice(): UnitSystem | null {
  try {
    const stored = window.sessionStorage.getItem(SESSION_UNITS_KEY);
    return (UNIT_SYSTEMS as readonly string[]).includes(stored ?? '')
      ? (stored as UnitSystem)
      : null;
  } catch {
    return null;
  }
}

function writeSessionChoice(system: UnitSystem | null): void {
  try {
    if (system) window.sessionStorage.setItem(SESSION_UNITS_KEY, system);
    else window.sessionStorage.removeItem(SESSION_UNITS_KEY);
  } catch {
    // Storage refused (private mode): the choice holds for this page only.
  }
}

/** Forget the session's explicit choice (on sign-out). */
export function clearSessionUnits(): void {
  writeSessionChoice(null);
}

interface UnitsState {
  readonly units: ReaderUnits & { readonly vacuumUnit: VacuumUnit | null };
  readonly setProjectSystem: (system: UnitSystem | null) => void;
  readonly choose: (system: UnitSystem) => void;
}

const UnitsContext = createContext<UnitsState>({
  units: { system: 'si', vacuumUnit: null },
  setProjectSystem: () => {},
  choose: () => {},
});

/**
 * The display units of the signed-in shell: `system` and `vacuumUnit` are
 * the person's own settings; project pages and the session's choice adjust
 * the system by `displayedUnitSystem`.
 */
export function UnitSystemProvider({
  system,
  vacuumUnit = null,
  children,
}: {
  system: UnitSystem;
  vacuumUnit?: VacuumUnit | null;
  children: ReactNode;
}) {
  const [project, setProject] = useState<UnitSystem | null>(null);
  const [session, setSession] = useState<UnitSystem | null>(readSessionChoice);
  const choose = useCallback((s: UnitSystem) => {
    writeSessionChoice(s);
    setSession(s);
  }, []);
  const value = useMemo<UnitsState>(
    () => ({
      units: {
        system: displayedUnitSystem({ account: system, project, session }),
        vacuumUnit,
      },
      setProjectSystem: setProject,
      choose,
    }),
    [system, project, session, vacuumUnit, choose],
  );
  return <UnitsContext.Provider value={value}>{children}</UnitsContext.Provider>;
}

/** The unit system numbers are displayed in here. */
export function useUnitSystem(): UnitSystem {
  return useContext(UnitsContext).units.system;
}

/** The reader's units for @hoopline/present: the displayed system and the person's vacuum unit. */
export function useReaderUnits(): ReaderUnits & { readonly vacuumUnit: VacuumUnit | null } {
  return useContext(UnitsContext).units;
}

/** The header switch: choose a unit system for the rest of the session. */
export function useChooseUnitSystem(): (system: UnitSystem) => void {
  return useContext(UnitsContext).choose;
}

/**
 * A project page says whose unit system it shows (undefined while the project
 * loads); the default display returns to the person's own when it closes.
 */
export function useProjectUnits(system: UnitSystem | undefined): void {
  const { setProjectSystem } = useContext(UnitsContext);
  useLayoutEffect(() => {
    if (!system) return undefined;
    setProjectSystem(system);
    return () => setProjectSystem(null);
  }, [system, setProjectSystem]);
}
