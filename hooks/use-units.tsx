import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import { displayToMetres, formatLength, lengthUnitOf, metresToDisplay, type UnitSystem } from './length-format';
import { readSetting, writeSetting } from './local-setting';

const KEY = 'loftline.units';

export type Units = {
  system: UnitSystem;
  setSystem: (s: UnitSystem) => void;
  formatLengthM: (m: number | null | undefined) => string;
  /** A number typed in the person's units, to metres. */
  lengthToM: (value: number) => number;
  /** Metres to a number in the person's units (for pre-filling a field). */
  mToLength: (m: number) => number;
  lengthUnit: 'm' | 'ft';
};

const UnitsContext = createContext<Units | null>(null);

function initialSystem(): UnitSystem {
  return readSetting(KEY) === 'imperial' ? 'imperial' : 'metric';
}

export function UnitsProvider({ children }: { children: ReactNode }) {
  const [system, setState] = useState<UnitSystem>(initialSystem);
  const setSystem = useCallback((s: UnitSystem) => {
    writeSetting(KEY, s);
    setState(s);
  }, []);
  const value = useMemo<Units>(
    () => ({
      system,
      setSystem,
      formatLengthM: (m) => formatLength(m, system),
      lengthToM: (v) => displayToMetres(v, system),
      mToLength: (m) => metresToDisplay(m, system),
      lengthUnit: lengthUnitOf(system),
    }),
    [system, setSystem],
  );
  return <UnitsContext.Provider value={value}>{children}</UnitsContext.Provider>;
}

export function useUnits(): Units {
  const ctx = useContext(UnitsContext);
  if (!ctx) throw new Error('useUnits must be used inside <UnitsProvider> (app/_layout.tsx mounts it)');
  return ctx;
}
