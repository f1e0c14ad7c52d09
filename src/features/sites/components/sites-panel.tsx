import { Link } from 'react-router-dom';
import { useFocusReturn } from '@/lib/use-focus-return';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { useSites } from '@/lib/api/sites';
import { SiteForm } from './site-form';

/** The project's sites with elevation, position and time zone; engineers and owners can add one. */
export function SitesPanel({ projectId, canEdit }: { projectId: number; canEdit: boolean }) {
  const sites = useSites(projectId);
  const { unitSystem } = useUnitSystem();
  // When the form closes, the focus goes back to the button that opened it, and a saved site is announced.
  const { open: adding, setOpen: setAdding, close, opener: addButton, closedWith: savedName } = useFocusReturn<string | null>();
  return (
    <Panel
      title="Sites"
      actions={
        canEdit && !adding ? (
          <button ref={addButton} type="button" onClick={() => setAdding(true)} className="rounded border border-rule px-2.5 py-1 text-xs hover:bg-mist">
            Add site
          </button>
        ) : undefined
      }
    >
      <p role="status" className="text-xs text-signal-ok empty:hidden">
        {savedName ? `Site “${savedName}” added.` : ''}
      </p>
      {sites.isPending && <div role="progressbar" className="h-16 animate-pulse rounded bg-mist" aria-label="Loading sites" />}
      {sites.isError && (
        <Notice tone="bad" title="Sites could not be loaded">
          {sites.error.message}
        </Notice>
      )}
      {sites.data && sites.data.sites.length === 0 && !adding && (
        <p className="text-sm text-ink-soft">
          No sites yet.{' '}
          {canEdit ? 'Add the site the weather belongs to; its elevation and time zone are used to read files.' : 'An engineer of the project adds them.'}
        </p>
      )}
      {sites.data && sites.data.sites.length > 0 && (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <thead>
              <tr className="border-b border-rule text-xs text-ink-soft">
                <th scope="col" className="py-1 font-medium">
                  Site
                </th>
                <th scope="col" className="px-2 text-right font-medium">
                  Elevation
                </th>
                <th scope="col" className="px-2 text-right font-medium">
                  Lat, long
                </th>
                <th scope="col" className="px-2 font-medium">
                  Time zone
                </th>
              </tr>
            </thead>
            <tbody>
              {sites.data.sites.map((s) => (
                <tr key={s.id} className="border-b border-rule/60">
                  <td className="py-1">
                    <Link to={`/projects/${projectId}/sites/${s.id}`} className="font-medium text-harbour underline-offset-2 underline hover:decoration-2">
                      {s.name}
                    </Link>
                  </td>
                  <td className="num px-2 text-right">{formatQuantity('elevation', unitSystem, s.elevationM)}</td>
                  <td className="num px-2 text-right text-ink-soft">
                    {s.latitude === null && s.longitude === null ? '–' : `${s.latitude?.toFixed(2) ?? '–'}, ${s.longitude?.toFixed(2) ?? '–'}`}
                  </td>
                  <td className="px-2 text-ink-soft">{s.timeZone}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {adding && (
        <div className="mt-3 rounded border border-rule p-3">
          <SiteForm projectId={projectId} onCreated={(site) => close(site.name)} onCancel={() => close(null)} />
        </div>
      )}
    </Panel>
  );
}
