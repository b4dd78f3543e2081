import { createContext, useCallback, useContext, useMemo, useSyncExternalStore, type ReactNode } from 'react';
import {
  formatArea, formatBoardFeet, formatDimensions, formatLength, formatLongLength, formatWeight, isUnitSystem, type UnitSystem,
} from '../../shared/wood/index';

const STORAGE_KEY = 'stickerline.units';

/** The browser's own choice, for visitors (and until a signed-in person's account has one). */
function readLocal(): UnitSystem {
  try {
    const v = window.localStorage.getItem(STORAGE_KEY);
    return isUnitSystem(v) ? v : 'imperial';
  } catch {
    return 'imperial';
  }
}
const listeners = new Set<() => void>();
function writeLocal(units: UnitSystem) {
  try { window.localStorage.setItem(STORAGE_KEY, units); } catch { /* private mode: the choice lasts this page only */ }
  listeners.forEach((l) => l());
}
const subscribe = (l: () => void) => {
  listeners.add(l);
  window.addEventListener('storage', l);
  return () => { listeners.delete(l); window.removeEventListener('storage', l); };
};

type UnitsContextValue = { units: UnitSystem; setUnits: (units: UnitSystem) => void };
const UnitsContext = createContext<UnitsContextValue>({ units: 'imperial', setUnits: writeLocal });

type Props = {
  /** The signed-in person's saved choice; null for a visitor or someone who has not chosen. */
  accountUnits: UnitSystem | null;
  /** Keeps a signed-in person's choice on their account; absent for visitors. */
  saveToAccount?: (units: UnitSystem) => void;
  children: ReactNode;
};

/** Which units every measurement on the page is written in. */
export function UnitsProvider({ accountUnits, saveToAccount, children }: Props) {
  const local = useSyncExternalStore(subscribe, readLocal, () => 'imperial' as const);
  const units = accountUnits ?? local;
  const setUnits = useCallback((next: UnitSystem) => {
    writeLocal(next);
    saveToAccount?.(next);
  }, [saveToAccount]);
  const value = useMemo(() => ({ units, setUnits }), [units, setUnits]);
  return <UnitsContext.Provider value={value}>{children}</UnitsContext.Provider>;
}

export const useUnits = () => useContext(UnitsContext);

/** The shared formatter, bound to the units the person chose: `m.length(26.3)` → "26 5/16 in" or "668 mm". */
export function useMeasures() {
  const { units } = useUnits();
  return useMemo(() => ({
    units,
    length: (inches: number) => formatLength(inches, units),
    longLength: (inches: number) => formatLongLength(inches, units),
    dimensions: (d: { thicknessIn: number; widthIn: number; lengthIn: number }) => formatDimensions(d, units),
    weight: (pounds: number) => formatWeight(pounds, units),
    boardFeet: (bf: number) => formatBoardFeet(bf, units),
    area: (squareFeet: number) => formatArea(squareFeet, units),
  }), [units]);
}

/** Inline measurements for JSX and table cells that cannot call a hook themselves. */
export function Length({ inches }: { inches: number }) {
  return <>{useMeasures().length(inches)}</>;
}
export function Dimensions({ of }: { of: { thicknessIn: number; widthIn: number; lengthIn: number } }) {
  return <>{useMeasures().dimensions(of)}</>;
}
export function Weight({ pounds }: { pounds: number }) {
  return <>{useMeasures().weight(pounds)}</>;
}
export function BoardFeet({ value }: { value: number }) {
  return <>{useMeasures().boardFeet(value)}</>;
}
