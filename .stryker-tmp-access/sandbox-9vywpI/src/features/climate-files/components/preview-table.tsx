// @ts-nocheck
import type { HumidityKind } from '../../../../shared/climate/types';
import { useUnitSystem } from '@/lib/unit-system';
import type { PreviewHour } from '../api/preview-climate-file';
import { previewColumns, previewRows } from '../lib/preview-values';

/** The first hours as the importer read them: SI, and the person's units when they work in IP. */
export function PreviewTable({
  hours,
  humidityKind,
  hasPressure,
  firstLines,
  timeZone,
}: {
  hours: PreviewHour[];
  humidityKind: HumidityKind;
  hasPressure: boolean;
  firstLines: string[];
  /** The site's IANA zone, to show each hour on the site's clock beside UTC. */
  timeZone: string;
}) {
  const { unitSystem } = useUnitSystem();
  const columns = previewColumns(humidityKind, hasPressure, unitSystem);
  const rows = previewRows(hours.slice(0, 24), humidityKind, unitSystem, timeZone);
  const both = unitSystem !== 'SI';
  return (
    <div className="space-y-3">
      <div className="overflow-x-auto">
        <table className="num w-full text-right text-xs" data-testid="preview-table">
          <caption className="pb-1 text-left font-sans text-sm text-ink-soft">
            First {rows.length} hours as read{both ? ', in SI and in IP' : ' (SI)'}, in UTC and on the site's clock ({timeZone}).
          </caption>
          <thead>
            <tr className="border-b border-rule font-sans text-ink-soft">
              <th scope="col" className="py-1 text-left font-medium">
                Hour (UTC)
              </th>
              <th scope="col" className="px-2 text-left font-medium">
                Site time
              </th>
              {columns.map((c) => (
                <th key={c.key} scope="col" colSpan={both ? 2 : 1} className="px-2 font-medium">
                  {c.label}
                </th>
              ))}
              <th scope="col" className="px-2 text-left font-medium">
                Flag
              </th>
            </tr>
            <tr className="border-b border-rule font-sans text-ink-faint">
              <th />
              <th />
              {columns.map((c) =>
                both ? (
                  [
                    <th key={`${c.key}-si`} className="px-2 font-normal">
                      {c.siUnit}
                    </th>,
                    <th key={`${c.key}-ip`} className="px-2 font-normal">
                      {c.shownUnit}
                    </th>,
                  ]
                ) : (
                  <th key={c.key} className="px-2 font-normal">
                    {c.siUnit}
                  </th>
                ),
              )}
              <th />
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.timeUtc} className="border-b border-rule/60">
                <td className="py-0.5 text-left">{row.timeUtc}</td>
                <td className="px-2 text-left text-ink-soft">{row.timeLocal}</td>
                {columns.map((c) =>
                  both ? (
                    [
                      <td key={`${c.key}-si`} className="px-2">
                        {row.values[c.key].si}
                      </td>,
                      <td key={`${c.key}-ip`} className="px-2 text-harbour">
                        {row.values[c.key].shown}
                      </td>,
                    ]
                  ) : (
                    <td key={c.key} className="px-2">
                      {row.values[c.key].si}
                    </td>
                  ),
                )}
                <td className={`px-2 text-left font-sans ${row.flag === 'measured' ? 'text-ink-soft' : 'text-signal-warn'}`}>{row.flag}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <details className="text-sm">
        <summary className="cursor-pointer text-ink-soft">The first lines of the file, as written</summary>
        <pre className="num mt-2 overflow-x-auto rounded border border-rule bg-paper p-2 text-xs">{firstLines.join('\n')}</pre>
      </details>
    </div>
  );
}
