import { formatCount, formatQuantity, numberFormat, unitOf } from '@/lib/quantity';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import { ModeColumnHead, modeSpecKey } from '@/components/ui/mode-marks';
import { countsSubsets, hoursOfSpec, hoursText as countText, modeRowSpecs, notCountedShort } from '../../../../shared/report/mode-subsets';
import { METRICS } from '../../../../shared/metrics';
import type { YearResults } from '../../../../shared/scenario/results';
import {
  PARTIAL_YEAR_MARK,
  partialYearsSentence,
  WORST_YEAR_TIE_RULE,
  YEAR_STATISTIC_ROWS,
  yearStatistics,
  yearStatisticsNote,
  type YearMetric,
  type YearPoint,
} from '../../../../shared/scenario/year-statistics';

const hoursText = (h: number) => formatCount(Math.round(h));
const mwhText = (kwh: number) => numberFormat(1).format(kwh / 1000);

/** The columns the statistics cover, in the table's order, with how each value is written. */
const statColumns: { metric: YearMetric; format: (v: number, system: UnitSystem) => string }[] = [
  { metric: 'free', format: hoursText },
  { metric: 'adiabatic', format: hoursText },
  { metric: 'mechanical', format: hoursText },
  { metric: 'coolingKwh', format: mwhText },
  { metric: 'waterL', format: (v, system) => formatQuantity('water', system, v, false) },
];

const statRows = YEAR_STATISTIC_ROWS;

/**
 * Hours, cooling energy and water for each calendar year of a multi-year file, then the median, P10 and
 * P90 years, the worst year and the spread over the full years. Partial years are listed, flagged, left out.
 */
export function YearTable({ years, engineVersion }: { years: YearResults[]; engineVersion: string }) {
  const { unitSystem } = useUnitSystem();
  const stats = yearStatistics(years);
  const partial = new Set(stats.partialYears.map((p) => p.year));
  return (
    <div className="space-y-3">
      <div className="overflow-x-auto">
        <table className="num w-full text-right text-xs" data-testid="year-table">
          <thead>
            <tr className="border-b border-rule text-ink-soft">
              <th scope="col" className="py-1 text-left font-sans font-medium">
                Year
              </th>
              {modeRowSpecs.map((spec) => (
                <ModeColumnHead key={modeSpecKey(spec)} spec={spec} />
              ))}
              <th scope="col" className="px-2 py-1 font-sans font-medium">
                {METRICS.cooling.label} (MWh)
              </th>
              <th scope="col" className="px-2 py-1 font-sans font-medium">
                {METRICS.waterTotal.label} ({unitOf('water', unitSystem)})
              </th>
            </tr>
          </thead>
          <tbody>
            {years.map((y) => (
              <tr key={y.year} className={`border-b border-rule/60 ${partial.has(y.year) ? 'text-ink-soft italic' : ''}`}>
                <th scope="row" className="py-0.5 text-left font-normal">
                  {y.year}
                  {partial.has(y.year) && <span className="ml-1.5 rounded bg-mist px-1 font-sans text-[11px] not-italic">{PARTIAL_YEAR_MARK}</span>}
                  {stats.worst?.year === y.year && <span className="ml-1.5 rounded bg-signal-bad px-1 font-sans text-[11px] text-paper">worst</span>}
                </th>
                {modeRowSpecs.map((spec) => (
                  <td key={modeSpecKey(spec)} className={`px-2 py-0.5 ${spec.kind === 'subset' ? 'text-ink-soft' : ''}`}>
                    {countText(hoursOfSpec(y, spec))}
                  </td>
                ))}
                <td className="px-2 py-0.5">{mwhText(y.coolingKwh)}</td>
                <td className="px-2 py-0.5">{formatQuantity('water', unitSystem, y.waterL, false)}</td>
              </tr>
            ))}
          </tbody>
          {stats.metrics && (
            <tbody data-testid="year-statistics">
              {statRows.map((row) => (
                <tr key={row.label} className="border-b border-rule/60 bg-mist/40">
                  <th scope="row" className="py-0.5 text-left font-sans font-medium" title={row.title}>
                    {row.label}
                  </th>
                  {modeRowSpecs.map((spec) => {
                    const column = spec.kind === 'mode' ? statColumns.find((c) => c.metric === spec.mode) : undefined;
                    return (
                      <StatCell
                        key={modeSpecKey(spec)}
                        point={column ? row.cell(stats.metrics![column.metric]) : null}
                        format={column?.format}
                        system={unitSystem}
                      />
                    );
                  })}
                  {statColumns.slice(3).map((c) => (
                    <StatCell key={c.metric} point={row.cell(stats.metrics![c.metric])} format={c.format} system={unitSystem} />
                  ))}
                </tr>
              ))}
            </tbody>
          )}
        </table>
      </div>
      {years.length > 0 && !countsSubsets({ hours: years[0] }) && <p className="text-xs text-ink-soft">{notCountedShort(engineVersion)}</p>}
      <YearNotes stats={stats} />
    </div>
  );
}

function StatCell({
  point,
  format,
  system,
}: {
  point: YearPoint | { value: number | null } | null;
  format?: (v: number, s: UnitSystem) => string;
  system: UnitSystem;
}) {
  if (!point || !format || point.value === null) return <td className="px-2 py-0.5 text-ink-soft">–</td>;
  return (
    <td className="px-2 py-0.5">
      {format(point.value, system)}
      {'year' in point && <span className="ml-1 text-[11px] text-ink-soft">({point.year})</span>}
    </td>
  );
}

function YearNotes({ stats }: { stats: ReturnType<typeof yearStatistics> }) {
  const n = stats.fullYears.length;
  return (
    <div className="space-y-1 text-xs text-ink-soft" data-testid="year-notes">
      {stats.worst && (
        <p>
          <span className="font-medium text-ink">Worst year: {stats.worst.year}</span>, {hoursText(stats.worst.mechanical)} mechanical hours
          {stats.worst.tiedWith.length > 0 && (
            <>
              {' '}
              (tied with {stats.worst.tiedWith.join(', ')} on mechanical hours; rule: {WORST_YEAR_TIE_RULE})
            </>
          )}
          .
        </p>
      )}
      <p>{yearStatisticsNote(n)}</p>
      {stats.partialYears.length > 0 && <p>{partialYearsSentence(stats.partialYears)}</p>}
      {!stats.metrics && <p>No full calendar year in this file, so no year statistics.</p>}
    </div>
  );
}
