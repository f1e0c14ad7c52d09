import type { RunListing } from '@/lib/api/runs';
import type { YearResults } from '../../../../shared/scenario/results';
import { yearStatistics, type YearPoint } from '../../../../shared/scenario/year-statistics';

const hours = (p: YearPoint) => (
  <>
    {Math.round(p.value).toLocaleString('en')}
    <span className="ml-1 text-[11px] text-ink-soft">({p.year})</span>
  </>
);

/**
 * Mechanical hours across the years of each run's climate file: median, P10 and P90 years (nearest rank),
 * the worst year and the spread. Runs on a single-year file, or with no full year, say so.
 */
export function YearSpreadTable({ runs, byRun }: { runs: RunListing[]; byRun: Map<number, YearResults[]> }) {
  return (
    <div className="space-y-2">
      <div className="overflow-x-auto">
        <table className="num w-full text-right text-xs" data-testid="year-spread-table">
          <thead>
            <tr className="border-b border-rule text-ink-soft">
              <th scope="col" className="py-1 pr-4 text-left font-sans font-medium">
                Run
              </th>
              <th scope="col" className="px-2 py-1 font-sans font-medium">
                Full years
              </th>
              <th scope="col" className="px-2 py-1 font-sans font-medium">
                P10 year (h)
              </th>
              <th scope="col" className="px-2 py-1 font-sans font-medium">
                Median year (h)
              </th>
              <th scope="col" className="px-2 py-1 font-sans font-medium">
                P90 year (h)
              </th>
              <th scope="col" className="px-2 py-1 font-sans font-medium">
                Worst year (h)
              </th>
              <th scope="col" className="px-2 py-1 font-sans font-medium">
                Min–max (h)
              </th>
              <th scope="col" className="px-2 py-1 font-sans font-medium">
                Std dev (h)
              </th>
            </tr>
          </thead>
          <tbody>
            {runs.map((run) => {
              const years = byRun.get(run.id);
              const stats = years ? yearStatistics(years) : null;
              const m = stats?.metrics?.mechanical;
              return (
                <tr key={run.id} className="border-b border-rule/60">
                  <th scope="row" className="py-0.5 pr-4 text-left font-sans font-normal">
                    Run {run.id}{' '}
                    <span className="text-ink-soft">
                      · {run.scenario.name} · {run.climate.name}
                    </span>
                  </th>
                  {!years && (
                    <td colSpan={7} className="px-2 py-0.5 text-ink-soft">
                      loading…
                    </td>
                  )}
                  {stats && !m && (
                    <td colSpan={7} className="px-2 py-0.5 font-sans text-ink-soft">
                      no full calendar year{stats.partialYears.length > 0 ? ` (${stats.partialYears.length} partial left out)` : ''}
                    </td>
                  )}
                  {stats && m && (
                    <>
                      <td className="px-2 py-0.5">
                        {stats.fullYears.length}
                        {stats.partialYears.length > 0 && <span className="ml-1 text-[11px] text-ink-soft">+{stats.partialYears.length} partial</span>}
                      </td>
                      <td className="px-2 py-0.5">{hours(m.p10)}</td>
                      <td className="px-2 py-0.5">{hours(m.median)}</td>
                      <td className="px-2 py-0.5">{hours(m.p90)}</td>
                      <td className="px-2 py-0.5">
                        {hours({ year: stats.worst!.year, value: stats.worst!.mechanical })}
                        {stats.worst!.tiedWith.length > 0 && <span className="ml-1 text-[11px] text-ink-soft">tied {stats.worst!.tiedWith.join(', ')}</span>}
                      </td>
                      <td className="px-2 py-0.5">
                        {Math.round(m.min.value).toLocaleString('en')}–{Math.round(m.max.value).toLocaleString('en')}
                      </td>
                      <td className="px-2 py-0.5">{m.standardDeviation === null ? '–' : Math.round(m.standardDeviation).toLocaleString('en')}</td>
                    </>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-soft">
        Mechanical hours per calendar year of each run's climate file. Percentiles by nearest rank (the year of rank ⌈P/100 · N⌉ among N full years ordered by
        mechanical hours), so each is a real year; the worst year has the most mechanical hours (a tie goes to more cooling energy, then the earlier year).
        Partial years, more than a day short of the calendar year's hours, are left out. The run page gives the same for free cooling, adiabatic assist, energy
        and water.
      </p>
    </div>
  );
}
