// @ts-nocheck
import type { DetectedMapping, FileHeader, ImportReport, TypicalYearInfo } from '../../../../shared/climate/types';
import { MONTH_SHORT } from '../../../../shared/calendar';
import { fixedOffsetZone } from '../../../../shared/time-zone';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';

/** The published format a file was recognised as, with the conventions it was read by. */
export function FileFormatNote({ mapping }: { mapping: DetectedMapping }) {
  if (!mapping.format) return null;
  return (
    <div className="rounded border border-harbour/40 bg-mist px-3 py-2 text-sm" data-testid="recognised-format">
      <p>
        Recognised as <strong>{mapping.format.name}</strong>: the columns and the time convention are the format's own.
      </p>
      <ul className="mt-1 list-disc pl-5 text-xs text-ink-soft">
        {mapping.format.conventions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </div>
  );
}

/** Which months came from which source years, in words: "Jan 2004 · Feb 1999 · …". */
export function typicalYearText(t: TypicalYearInfo): string {
  return t.sourceYearByMonth.flatMap((year, m) => (year === null ? [] : [`${MONTH_SHORT[m]} ${year}`])).join(' · ');
}

/**
 * What the file's own header says (station, position, elevation, UTC offset) and, for a typical year, the
 * year it was placed in and each month's source year; beside the site's values when a site is given,
 * with the header-site warnings of the report.
 */
export function FileOrigin({
  report,
  site,
  onNewSite,
  newSiteOpen = false,
}: {
  report: ImportReport;
  site?: { name: string; elevationM: number; timeZone: string; latitude?: number | null; longitude?: number | null };
  /** Offered when given: start a new site from the header's values (the button toggles it). */
  onNewSite?: () => void;
  newSiteOpen?: boolean;
}) {
  const { unitSystem } = useUnitSystem();
  const header: FileHeader | null = report.fileHeader ?? null;
  const typical = report.typicalYear ?? null;
  if (!header && !typical) return null;
  const mismatches = report.issues.filter((i) => i.kind === 'header-site-mismatch');
  const flagged = new Set(mismatches.map((m) => m.column));
  const degrees = (v: number | null | undefined) => (v === null || v === undefined ? '—' : `${v.toFixed(3)}°`);
  const rows: [string, string, string | null, boolean][] = header
    ? [
        ['Station', [header.name, header.region, header.country].filter(Boolean).join(', ') || '—', site ? site.name : null, false],
        ['Station number · source', [header.stationId, header.source].filter(Boolean).join(' · ') || '—', null, false],
        ['Latitude', degrees(header.latitude), site ? degrees(site.latitude) : null, false],
        ['Longitude', degrees(header.longitude), site ? degrees(site.longitude) : null, false],
        [
          'Elevation',
          header.elevationM === null ? '—' : formatQuantity('elevation', unitSystem, header.elevationM),
          site ? formatQuantity('elevation', unitSystem, site.elevationM) : null,
          flagged.has('elevationM'),
        ],
        [
          'Local standard time',
          header.utcOffsetHours === null ? '—' : fixedOffsetZone(Math.round(header.utcOffsetHours * 60)),
          site ? site.timeZone : null,
          flagged.has('utcOffsetHours'),
        ],
      ]
    : [];
  return (
    <div className="space-y-2 text-sm" data-testid="file-origin">
      {header && (
        <table className="w-full max-w-2xl text-left">
          <thead className="text-xs text-ink-soft">
            <tr>
              <th className="py-1 pr-3 font-normal">From the file's header (line {header.line})</th>
              <th className="py-1 pr-3 font-normal">File</th>
              {site && <th className="py-1 font-normal">Site</th>}
            </tr>
          </thead>
          <tbody>
            {rows
              .filter(([, file]) => file !== '—')
              .map(([label, file, siteValue, bad]) => (
                <tr key={label} className={`border-t border-rule ${bad ? 'bg-signal-warn/10' : ''}`}>
                  <td className="py-1 pr-3 text-ink-soft">{label}</td>
                  <td className="num py-1 pr-3">{file}</td>
                  {site && <td className={`num py-1 ${bad ? 'font-semibold text-signal-warn' : ''}`}>{siteValue ?? ''}</td>}
                </tr>
              ))}
          </tbody>
        </table>
      )}
      {mismatches.map((m) => (
        <p key={m.message} role="status" className="text-signal-warn">
          {m.message}
        </p>
      ))}
      {typical && (
        <p data-testid="typical-year">
          Typical year, read as one continuous year placed in <span className="num">{typical.year}</span>. Source years:{' '}
          <span className="num">{typicalYearText(typical)}</span>.
        </p>
      )}
      {onNewSite && header && (
        <button type="button" className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist" onClick={onNewSite}>
          {newSiteOpen ? 'Close the new-site form' : 'New site from this header'}
        </button>
      )}
    </div>
  );
}
