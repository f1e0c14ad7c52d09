// @ts-nocheck
import { useEffect, useEffectEvent, useRef } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import { meQueryOptions, useUpdateSettings } from '../api/me';
import { useSession } from '../api/get-session';

/**
 * Keeps the unit system remembered per person: on sign-in the person's saved choice is adopted, and any
 * later toggle (on any page) is saved to their settings. Signed out, the browser's own choice holds.
 */
export function UnitSystemSync() {
  const session = useSession();
  const me = useQuery({ ...meQueryOptions(), enabled: session.data?.signedIn === true });
  const { unitSystem, setUnitSystem } = useUnitSystem();
  const update = useUpdateSettings();
  const adoptedFor = useRef<number | null>(null);
  const atPageLoad = useRef(unitSystem);
  // An effect event reads the mutation's latest pending flag without making each new mutation object (one per
  // render) a reason to run the effect again.
  const save = useEffectEvent((choice: UnitSystem) => {
    if (!update.isPending) update.mutate({ unitSystem: choice === 'IP' ? 'ip' : 'si' });
  });

  useEffect(() => {
    if (!me.data) return;
    const saved = me.data.settings.unitSystem === 'ip' ? 'IP' : 'SI';
    if (adoptedFor.current !== me.data.user.id) {
      adoptedFor.current = me.data.user.id;
      // A toggle made on this page before the settings arrived wins (and is saved below); otherwise the saved choice does.
      if (unitSystem === atPageLoad.current) {
        if (saved !== unitSystem) setUnitSystem(saved);
        return;
      }
    }
    if (saved !== unitSystem) save(unitSystem);
  }, [me.data, unitSystem, setUnitSystem]);

  return null;
}
