import { downloadCsv } from '@/lib/download';
import { runDisplayName } from '@/lib/sweep-value';
import { useUnitSystem } from '@/lib/unit-system';
import type { RunListing } from '@/lib/api/runs';
import { formatMetric } from '@/lib/metric-text';
import { comparisonCsv, type ComparedRow, type ComparedRun } from '../../../../shared/report/comparison';
import { countsSubsets, NOT_COUNTED, notCountedShort } from '../../../../shared/report/mode-subsets';

const verdictInk = { better: 'text-signal-ok', worse: 'text-signal-bad', same: 'text-ink-soft', none: 'text-ink-soft' };

/** Metrics down, runs across, each with its difference from the baseline. */
export function ComparisonTable({
  rows,
  runs,
  compared,
  baselineId,
}: {
  rows: ComparedRow[];
  runs: RunListing[];
  /** The same runs as compared (those with results). */
  compared: ComparedRun[];
  baselineId: number;
}) {
  const { unitSystem } = useUnitSystem();
  const byId = new Map(runs.map((r) => [r.id, r]));
  function download() {
    // The comparison report's CSV, with a sweep point's values in each run's name.
    const name = (run: ComparedRun) => runDisplayName(run.scenario.name, byId.get(run.id)?.sweepPoint ?? null, unitSystem);
    downloadCsv(`comparison-${compared.map((r) => r.id).join('-')}.csv`, comparisonCsv(compared, baselineId, unitSystem, name));
  }
  return (
    <div className="overflow-x-auto">
      <div className="mb-2 flex justify-end">
        <button type="button" onClick={download} className="rounded border border-rule px-3 py-1 text-xs hover:bg-mist">
          Download CSV
        </button>
      </div>
      <table className="w-full text-sm" data-testid="comparison-table">
        <thead>
          <tr className="border-b border-rule align-bottom text-xs text-ink-soft">
            <th scope="col" className="py-1 pr-4 text-left font-medium">
              Figure
            </th>
            {rows[0]?.cells.map((c) => {
              const run = byId.get(c.runId)!;
              return (
                <th key={c.runId} scope="col" className="min-w-40 px-2 py-1 text-right font-medium">
                  <span className="block text-ink">
                    Run {run.id}
                    {run.id === baselineId && <span className="ml-1 rounded bg-harbour px-1 text-[10px] text-paper">baseline</span>}
                  </span>
                  <span className="block font-normal">{runDisplayName(run.scenario.name, run.sweepPoint, unitSystem)}</span>
                  <span className="block font-normal text-ink-faint">
                    {run.climate.site.name} · {run.climate.name}
                  </span>
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {rows.map(({ metric, cells }) => (
            <tr key={metric.key} className={`border-b border-rule/60 ${metric.part ? 'text-ink-soft' : ''}`} data-testid={`compare-row-${metric.key}`}>
              <th scope="row" className={metric.part ? 'py-0.5 pl-5 pr-4 text-left text-xs font-normal' : 'py-1 pr-4 text-left font-normal'}>
                {metric.label}
              </th>
              {cells.map((c) => (
                <td key={c.runId} className={`num px-2 text-right ${metric.part ? 'py-0.5 text-xs' : 'py-1'}`}>
                  <span className="block">{c.value === null && metric.notInOldRuns ? NOT_COUNTED : formatMetric(metric, unitSystem, c.value)}</span>
                  {c.difference !== null && (
                    <span className={`block text-xs ${verdictInk[c.verdict]}`}>
                      {formatMetric(metric, unitSystem, c.difference, { signed: true })}
                      {c.differencePct !== null && ` (${c.differencePct > 0 ? '+' : ''}${c.differencePct.toFixed(1)} %)`}
                    </span>
                  )}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {runs
        .filter((r) => r.results && !countsSubsets(r.results))
        .map((r) => (
          <p key={r.id} className="mt-2 text-xs text-ink-soft">
            Run {r.id}: {notCountedShort(r.engineVersion)}
          </p>
        ))}
      <p className="mt-2 text-xs text-ink-soft">
        Differences are against the baseline; green where the figure improves, red where it worsens. Energy and water are scaled to 8,760 hours so files of
        different lengths compare.
      </p>
    </div>
  );
}
