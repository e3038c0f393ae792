import { createContext, useContext, useMemo, type ReactNode } from 'react';
import { DEFAULT_UNIT_PREFERENCES, type UnitPreferences } from '../../../shared/schemas/unit-preferences.ts';
import { chosenUnits, type ChosenUnits } from './unit-table.ts';

const defaults = chosenUnits({ ...DEFAULT_UNIT_PREFERENCES });
const UnitsContext = createContext<ChosenUnits>(defaults);

/** Given the signed-in person's preference (from GET /api/auth/me); pages outside it read the defaults. */
export function UnitsProvider({ prefs, children }: { prefs: UnitPreferences | undefined; children: ReactNode }) {
  const value = useMemo(() => (prefs ? chosenUnits(prefs) : defaults), [prefs]);
  return <UnitsContext.Provider value={value}>{children}</UnitsContext.Provider>;
}

/** The display units the person chose for damper velocity, rates, speed and length. */
export function useUnits(): ChosenUnits {
  return useContext(UnitsContext);
}
