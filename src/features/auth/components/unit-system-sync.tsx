import { useEffect, useRef } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useUnitSystem } from '@/lib/unit-system';
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
    if (saved !== unitSystem && !update.isPending) update.mutate({ unitSystem: unitSystem === 'IP' ? 'ip' : 'si' });
    // `update` is a new object every render and is left out on purpose: only its pending flag is read.
  }, [me.data, unitSystem, setUnitSystem]);

  return null;
}
