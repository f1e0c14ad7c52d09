// @ts-nocheck
import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';

export type UnitSystem = 'SI' | 'IP';

interface UnitSystemContext {
  unitSystem: UnitSystem;
  setUnitSystem: (next: UnitSystem) => void;
  /** Inside a LocalUnitSystem: switching changes this part of the page only, not the person's setting. */
  local?: boolean;
}

const Context = createContext<UnitSystemContext | null>(null);
const storageKey = 'tramontane.unitSystem';

function stored(): UnitSystem {
  try {
    return localStorage.getItem(storageKey) === 'IP' ? 'IP' : 'SI';
  } catch {
    return 'SI';
  }
}

/**
 * SI by default, IP on a toggle. The choice is kept in the browser at once; `onChange` lets the
 * signed-in person's settings on the server follow it, so it is remembered per person.
 */
export function UnitSystemProvider({ children, onChange }: { children: ReactNode; onChange?: (next: UnitSystem) => void }) {
  const [unitSystem, setState] = useState<UnitSystem>(stored);
  const setUnitSystem = useCallback(
    (next: UnitSystem) => {
      setState(next);
      try {
        localStorage.setItem(storageKey, next);
      } catch {
        // Private windows may refuse storage; the choice still holds for this visit.
      }
      onChange?.(next);
    },
    [onChange],
  );
  const value = useMemo(() => ({ unitSystem, setUnitSystem }), [unitSystem, setUnitSystem]);
  return <Context.Provider value={value}>{children}</Context.Provider>;
}

export function useUnitSystem(): UnitSystemContext {
  const value = useContext(Context);
  if (!value) throw new Error('useUnitSystem must be used inside UnitSystemProvider');
  return value;
}

/**
 * A unit switch for one part of a page (a chart, a report): inside it, `useUnitSystem` gives the local choice, and
 * its `setUnitSystem` changes only that part, never the person's setting. It starts from, and follows, the setting
 * until the person switches it here. `isLocal` tells a switch to say it acts here only.
 */
export function LocalUnitSystem({ children }: { children: ReactNode }) {
  const outer = useUnitSystem();
  const [local, setLocal] = useState<UnitSystem | null>(null);
  const value = useMemo(() => ({ unitSystem: local ?? outer.unitSystem, setUnitSystem: setLocal, local: true }), [local, outer.unitSystem]);
  return <Context.Provider value={value}>{children}</Context.Provider>;
}
