import { createContext, useContext, type ReactNode } from 'react';
import type { UnitSystem } from '@hoopline/contract';

const UnitSystemContext = createContext<UnitSystem>('si');

/** The unit system numbers are displayed in (the signed-in user's choice, PATCH /api/me). */
export function UnitSystemProvider({
  system,
  children,
}: {
  system: UnitSystem;
  children: ReactNode;
}) {
  return <UnitSystemContext.Provider value={system}>{children}</UnitSystemContext.Provider>;
}

export function useUnitSystem(): UnitSystem {
  return useContext(UnitSystemContext);
}
