import { Link } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useClimateFiles } from '@/lib/api/climate-files';

/** Calendar year of an instant on the site's standard-time clock (a local-time file starting 1 January stays in that year). */

/** The project's climate files: site, period, hours and how complete they are; a link to upload another. */
export function ClimateFilesPanel({
  projectId,
  canEdit,
  siteId,
  title = 'Climate files',
}: {
  projectId: number;
  canEdit: boolean;
  /** Only this site's files. */
  siteId?: number;
  title?: string;
}) {
  const files = useClimateFiles(projectId);
  const listed = files.data?.climateFiles.filter((f) => siteId === undefined || f.siteId === siteId) ?? [];
  return (
    <Panel
      title={title}
      actions={
        canEdit ? (
          <Link
            to={`/projects/${projectId}/climate-files/new${siteId === undefined ? '' : `?siteId=${siteId}`}`}
            className="rounded bg-harbour px-2.5 py-1 text-xs text-paper hover:bg-harbour-soft"
          >
            Upload climate file
          </Link>
        ) : undefined
      }
    >
      {files.isPending && <div role="progressbar" className="h-16 animate-pulse rounded bg-mist" aria-label="Loading climate files" />}
      {files.isError && (
        <Notice tone="bad" title="Climate files could not be loaded">
          {files.error.message}
        </Notice>
      )}
      {files.data && listed.length === 0 && (
        <p className="text-sm text-ink-soft">
          No climate files {siteId === undefined ? 'yet' : 'for this site yet'}.{' '}
          {canEdit ? 'Upload hourly weather for a site (CSV or other delimited text) to start.' : 'An engineer of the project uploads them.'}
        </p>
      )}
      {listed.length > 0 && (
        <table className="w-full text-left text-sm">
          <thead>
            <tr className="border-b border-rule text-xs text-ink-soft">
              <th scope="col" className="py-1 font-medium">
                File
              </th>
              <th scope="col" className="px-2 font-medium">
                Site
              </th>
              <th scope="col" className="px-2 text-right font-medium">
                Years
              </th>
              <th scope="col" className="px-2 text-right font-medium">
                Hours
              </th>
              <th scope="col" className="px-2 text-right font-medium">
                Missing
              </th>
            </tr>
          </thead>
          <tbody>
            {listed.map((f) => {
              const [a, b] = [f.years[0], f.years[f.years.length - 1]];
              return (
                <tr key={f.id} className="border-b border-rule/60">
                  <td className="py-1">
                    <Link
                      to={`/projects/${projectId}/climate-files/${f.id}`}
                      className="font-medium text-harbour underline-offset-2 underline hover:decoration-2"
                    >
                      {f.name}
                    </Link>
                    {f.projection && (
                      <span
                        title={`Future-climate projection of ${f.projection.parentName} (${f.projection.method}), not measured weather`}
                        className="ml-2 rounded-sm border border-harbour/40 bg-mist px-1 py-px text-[0.68rem] font-semibold uppercase tracking-wide text-harbour"
                      >
                        Projection
                      </span>
                    )}
                  </td>
                  <td className="px-2 text-ink-soft">{f.siteName}</td>
                  <td className="num px-2 text-right">{a === b ? a : `${a}–${b}`}</td>
                  <td className="num px-2 text-right">{f.hours.toLocaleString('en')}</td>
                  <td className={`num px-2 text-right ${f.missingHours ? 'text-signal-warn' : 'text-ink-soft'}`}>
                    {f.missingHours ? `${((100 * f.missingHours) / f.hours).toFixed(1)} %` : 'none'}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
    </Panel>
  );
}
