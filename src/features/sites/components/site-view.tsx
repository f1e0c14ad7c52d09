import { useState, type ReactNode } from 'react';
import { standardPressurePa } from '../../../../shared/psychrometrics';
import { standardOffsetMinutes, utcOffsetLabel } from '../../../../shared/time-zone';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { useFocusReturn } from '@/lib/use-focus-return';
import { useDeleteSite } from '../api/delete-site';
import { useSites, type Site } from '@/lib/api/sites';
import { SiteForm } from './site-form';

const degrees = (v: number | null) => (v === null ? '–' : `${v.toFixed(3)}°`);

/** One site: where it is, the pressure its elevation implies, its climate files; engineers can edit or delete it. */
export function SiteView({
  projectId,
  siteId,
  canEdit,
  climateFiles,
  onDeleted,
}: {
  projectId: number;
  siteId: number;
  canEdit: boolean;
  /** The site's climate files, from the climate-files feature. */
  climateFiles: ReactNode;
  onDeleted: () => void;
}) {
  const sites = useSites(projectId);
  const site = sites.data?.sites.find((s) => s.id === siteId);
  if (sites.isPending) return <div role="progressbar" className="h-40 animate-pulse rounded bg-mist" aria-label="Loading the site" />;
  if (sites.isError)
    return (
      <Notice tone="bad" title="The site could not be loaded">
        {sites.error.message}
      </Notice>
    );
  if (!site) {
    return (
      <Notice tone="bad" title="This site does not exist">
        It may have been deleted. Go back to the project to see its sites.
      </Notice>
    );
  }
  return <Loaded projectId={projectId} site={site} canEdit={canEdit} climateFiles={climateFiles} onDeleted={onDeleted} />;
}

function Loaded({
  projectId,
  site,
  canEdit,
  climateFiles,
  onDeleted,
}: {
  projectId: number;
  site: Site;
  canEdit: boolean;
  climateFiles: ReactNode;
  onDeleted: () => void;
}) {
  const { unitSystem } = useUnitSystem();
  // When the form closes, the focus goes back to "Edit site", and a save is announced.
  const { open: editing, setOpen: setEditing, close, opener: editButton, closedWith: saved } = useFocusReturn<boolean>();
  const [confirming, setConfirming] = useState(false);
  const remove = useDeleteSite(projectId);
  const facts: Array<[string, string, string?]> = [
    ['Elevation', formatQuantity('elevation', unitSystem, site.elevationM)],
    [
      'Standard pressure',
      formatQuantity('pressure', unitSystem, standardPressurePa(site.elevationM)),
      'used when a file has no pressure (standard atmosphere)',
    ],
    ['Latitude, longitude', site.latitude === null && site.longitude === null ? 'not given' : `${degrees(site.latitude)}, ${degrees(site.longitude)}`],
    ['Time zone', site.timeZone, `standard time ${utcOffsetLabel(standardOffsetMinutes(site.timeZone))}; reads local timestamps in files`],
  ];
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-sm text-ink-soft">Site</p>
          <h1 className="text-xl font-semibold">{site.name}</h1>
        </div>
        {canEdit && !editing && (
          <div className="flex flex-wrap gap-2 text-sm">
            <button ref={editButton} type="button" onClick={() => setEditing(true)} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
              Edit site
            </button>
            {!confirming && (
              <button
                type="button"
                onClick={() => setConfirming(true)}
                className="rounded border border-rule bg-panel px-3 py-1.5 text-signal-bad hover:bg-[#fbeceb]"
              >
                Delete…
              </button>
            )}
          </div>
        )}
      </div>
      <p role="status" className="text-sm text-signal-ok empty:hidden">
        {saved ? 'Site saved.' : ''}
      </p>
      {confirming && (
        <div
          role="alertdialog"
          aria-label="Delete site"
          className="flex flex-wrap items-center gap-2 rounded border border-signal-bad/40 bg-[#fbeceb] px-3 py-2 text-sm"
        >
          <span>
            Delete <strong>{site.name}</strong> with all its climate files? Runs already made keep their results.
          </span>
          <button
            type="button"
            disabled={remove.isPending}
            onClick={() => remove.mutateAsync(site.id).then(onDeleted, () => undefined)}
            className="rounded bg-signal-bad px-3 py-1 text-paper disabled:opacity-50"
          >
            Delete site and files
          </button>
          <button type="button" onClick={() => setConfirming(false)} className="rounded border border-rule bg-panel px-3 py-1">
            Keep it
          </button>
          {remove.isError && (
            <span role="alert" className="w-full text-signal-bad">
              {remove.error instanceof ApiError ? remove.error.message : 'The site could not be deleted.'}
            </span>
          )}
        </div>
      )}
      {editing ? (
        <Panel title="Edit site">
          <SiteForm projectId={projectId} site={site} onCreated={() => close(true)} onCancel={() => close(false)} />
          <p className="mt-2 text-xs text-ink-soft">
            Changing the elevation or time zone affects how files are read from now on; climate files already stored keep the hours they were read with.
          </p>
        </Panel>
      ) : (
        <dl className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4" data-testid="site-facts">
          {facts.map(([label, value, note]) => (
            <div key={label} className="rounded-md border border-rule bg-panel px-4 py-3">
              <dt className="text-xs text-ink-soft">{label}</dt>
              <dd className="num mt-0.5 text-lg font-semibold">{value}</dd>
              {note && <dd className="text-xs text-ink-soft">{note}</dd>}
            </div>
          ))}
        </dl>
      )}
      {climateFiles}
    </div>
  );
}
