import { useId, type ReactNode } from 'react';
import type { SitePrefill } from '../../../../shared/climate/formats/site-check';
import { Panel } from '@/components/ui/panel';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { button, quietButton } from '../lib/wizard-buttons';

export interface WizardSite {
  id: number;
  name: string;
  elevationM: number;
  timeZone: string;
  latitude?: number | null;
  longitude?: number | null;
}

/** The site form the route hands in; `prefill` starts a new site from a file header's values. */
export type RenderNewSite = (onCreated: (siteId: number) => void, prefill?: SitePrefill) => ReactNode;

/** Step 1: pick the site, or create one with the form the route hands in. */
export function SiteStep({
  sites,
  siteId,
  setSiteId,
  creatingSite,
  setCreatingSite,
  renderNewSite,
  onContinue,
}: {
  sites: WizardSite[];
  siteId: number | null;
  setSiteId: (id: number) => void;
  creatingSite: boolean;
  setCreatingSite: (creating: boolean) => void;
  renderNewSite: RenderNewSite;
  onContinue: () => void;
}) {
  const ids = useId();
  const { unitSystem } = useUnitSystem();
  const site = sites.find((s) => s.id === siteId) ?? null;
  return (
    <Panel title="Which site is this weather for?">
      <div className="space-y-4">
        <p className="text-sm text-ink-soft">The site's elevation sets the pressure when the file has none, and its time zone reads local timestamps.</p>
        {sites.length > 0 && (
          <fieldset className="space-y-1">
            <legend className="sr-only">Site</legend>
            {sites.map((s) => (
              <label
                key={s.id}
                className="flex cursor-pointer items-center gap-3 rounded border border-rule px-3 py-2 hover:bg-mist has-[:checked]:border-harbour has-[:checked]:bg-mist"
              >
                <input type="radio" name={`${ids}-site`} value={s.id} checked={siteId === s.id} onChange={() => setSiteId(s.id)} />
                <span className="font-medium">{s.name}</span>
                <span className="num text-xs text-ink-soft">
                  {formatQuantity('elevation', unitSystem, s.elevationM)} · {s.timeZone}
                </span>
              </label>
            ))}
          </fieldset>
        )}
        {creatingSite ? (
          <div className="rounded border border-rule p-3">
            <h3 className="mb-2 text-sm font-semibold">New site</h3>
            {renderNewSite((id) => {
              setSiteId(id);
              setCreatingSite(false);
            })}
          </div>
        ) : (
          <button type="button" className={quietButton} onClick={() => setCreatingSite(true)}>
            Add a new site
          </button>
        )}
        <div>
          <button type="button" className={button} disabled={!siteId} onClick={onContinue}>
            Continue with {site ? site.name : 'the chosen site'}
          </button>
        </div>
      </div>
    </Panel>
  );
}
