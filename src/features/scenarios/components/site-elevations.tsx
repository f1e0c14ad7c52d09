import { Link } from 'react-router-dom';
import { formatQuantity } from '@/lib/quantity';
import { standardPressurePa } from '../../../../shared/psychrometrics';
import { useUnitSystem } from '@/lib/unit-system';
import type { ListedClimateFile as ClimateFileListing } from '@/lib/api/climate-files';

/**
 * The elevation a run of this scenario uses: its climate file's site's, shown read-only with a link to the
 * site, where it is changed. A scenario has no elevation of its own (one elevation: the site's).
 */
export function SiteElevations({ projectId, climateFiles }: { projectId: number; climateFiles: ClimateFileListing[] }) {
  const { unitSystem } = useUnitSystem();
  const sites = [...new Map(climateFiles.map((f) => [f.siteId, f])).values()];
  return (
    <div className="mt-3 grid grid-cols-[minmax(11rem,15rem)_1fr] items-baseline gap-x-3 text-sm" data-testid="site-elevations">
      <span>Site elevation</span>
      <div>
        {sites.length === 0 ? (
          <p className="text-ink-soft">Set by the site of the climate file a run uses; this project has no climate file yet.</p>
        ) : (
          <ul className="space-y-0.5">
            {sites.map((f) => (
              <li key={f.siteId}>
                <Link to={`/projects/${projectId}/sites/${f.siteId}`} className="text-harbour underline underline-offset-2">
                  {f.siteName}
                </Link>
                : <span className="num">{formatQuantity('elevation', unitSystem, f.siteElevationM)}</span>{' '}
                <span className="text-xs text-ink-soft">
                  (standard pressure {formatQuantity('pressure', unitSystem, standardPressurePa(f.siteElevationM))})
                </span>
              </li>
            ))}
          </ul>
        )}
        <p className="text-xs text-ink-soft">
          A run takes the elevation of its climate file's site: it sets the air pressure where the file has none, and lowers the envelope's maximum on high
          sites. Change it on the site's page.
        </p>
      </div>
    </div>
  );
}
