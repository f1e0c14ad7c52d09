import { Link } from 'react-router-dom';
import { hoursOfMode, modeKeys, modeLabels } from '../../../../shared/modes';
import { ModeShareBar } from '@/components/ui/mode-marks';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { foldSweepPoints, freeShareText, sweepRowSummary, type SweepRow } from '@/lib/run-list-folding';
import { useProjectRuns, type RunListing, type RunStatus } from '@/lib/api/runs';

const statusStyle: Record<RunStatus, { text: string; className: string }> = {
  queued: { text: 'queued', className: 'bg-mist text-ink-soft' },
  running: { text: 'running', className: 'bg-mist text-harbour' },
  done: { text: 'done', className: 'bg-[#e4efe8] text-signal-ok' },
  failed: { text: 'failed', className: 'bg-[#fbeceb] text-signal-bad' },
  cancelled: { text: 'cancelled', className: 'bg-paper text-ink-soft' },
};

/** The share of hours in each mode as one thin bar, in the one mode palette, and the free-cooling share in words. */
function ModeShares({ hours }: { hours: NonNullable<RunListing['results']>['hours'] }) {
  const total = hours.total || 1;
  const words = modeKeys
    .filter((k) => hoursOfMode(hours, k) > 0)
    .map((k) => `${modeLabels[k]} ${((100 * hoursOfMode(hours, k)) / total).toFixed(0)} %`)
    .join(', ');
  return (
    <div className="flex items-center gap-2">
      <ModeShareBar hours={hours} className="h-2 w-32" label={words} />
      <span className="num text-xs text-ink-soft">{((100 * hours.free) / total).toFixed(1)} % free</span>
    </div>
  );
}

/** A sweep's state in the status column: how far its points have got, or that they all finished. */
function sweepStatus(row: SweepRow<RunListing>): { text: string; className: string } {
  if (row.active > 0) return { text: `running ${Math.round((100 * (row.points - row.active)) / row.points)} %`, className: statusStyle.running.className };
  if (row.failed > 0) return { text: `${row.failed} failed`, className: statusStyle.failed.className };
  return { text: 'all done', className: statusStyle.done.className };
}

/** One row standing for all the points of a sweep, linking to the sweep's page. */
function SweepRunsRow({ projectId, row }: { projectId: number; row: SweepRow<RunListing> }) {
  const status = sweepStatus(row);
  return (
    <tr className="border-b border-rule/60 bg-paper/60" data-testid="sweep-row">
      <td className="py-1">
        <span className="rounded border border-rule px-1 text-xs text-ink-soft">sweep</span>
      </td>
      <td className="px-2">
        <Link to={`/projects/${projectId}/sweeps/${row.sweepId}`} className="text-harbour underline-offset-2 underline hover:decoration-2">
          {row.name}
        </Link>
        : <span className="num text-xs text-ink-soft">{sweepRowSummary(row)}</span>
      </td>
      <td className="px-2 text-ink-soft">
        {row.lead.climate.name} · {row.lead.climate.site.name}
      </td>
      <td className="px-2">
        <span className={`num rounded px-1.5 py-0.5 text-xs ${status.className}`}>{status.text}</span>
      </td>
      <td className="num px-2 text-xs text-ink-soft">{row.freeShare ? freeShareText(row.freeShare) : '–'}</td>
    </tr>
  );
}

export function RunsPanel({ projectId }: { projectId: number }) {
  const runs = useProjectRuns(projectId);
  // A sweep's points (up to 200) fold into one row each, so the plain runs stay in view.
  const folded = foldSweepPoints(runs.data?.runs ?? [], { runs: 10, sweeps: 5 });
  const recent = folded.entries;
  const hasSweepRows = recent.some((e) => e.kind === 'sweep');
  return (
    <Panel
      title="Recent runs"
      actions={
        runs.data && runs.data.runs.filter((r) => r.status === 'done').length > 1 ? (
          <Link to={`/projects/${projectId}/compare`} className="rounded border border-rule px-2.5 py-1 text-xs hover:bg-mist">
            Compare runs
          </Link>
        ) : undefined
      }
    >
      {runs.isPending && <div role="progressbar" className="h-16 animate-pulse rounded bg-mist" aria-label="Loading runs" />}
      {runs.isError && (
        <Notice tone="bad" title="Runs could not be loaded">
          {runs.error.message}
        </Notice>
      )}
      {runs.data && recent.length === 0 && <p className="text-sm text-ink-soft">No runs yet. Open a scenario and run it on one or more climate files.</p>}
      {recent.length > 0 && (
        <table className="w-full text-left text-sm" data-testid="runs-table">
          <thead>
            <tr className="border-b border-rule text-xs text-ink-soft">
              <th scope="col" className="py-1 font-medium">
                Run
              </th>
              <th scope="col" className="px-2 font-medium">
                Scenario
              </th>
              <th scope="col" className="px-2 font-medium">
                Climate file
              </th>
              <th scope="col" className="px-2 font-medium">
                Status
              </th>
              <th scope="col" className="px-2 font-medium">
                Hours by mode
              </th>
            </tr>
          </thead>
          <tbody>
            {recent.map((entry) => {
              if (entry.kind === 'sweep') return <SweepRunsRow key={`sweep-${entry.sweep.sweepId}`} projectId={projectId} row={entry.sweep} />;
              const r = entry.run;
              return (
                <tr key={r.id} className="border-b border-rule/60">
                  <td className="num py-1">
                    <Link to={`/projects/${projectId}/runs/${r.id}`} className="text-harbour underline-offset-2 underline hover:decoration-2">
                      #{r.id}
                    </Link>
                  </td>
                  <td className="px-2">{r.scenario.name}</td>
                  <td className="px-2 text-ink-soft">
                    {r.climate.name} · {r.climate.site.name}
                  </td>
                  <td className="px-2">
                    <span className={`num rounded px-1.5 py-0.5 text-xs ${statusStyle[r.status].className}`} title={r.error ?? undefined}>
                      {statusStyle[r.status].text}
                    </span>
                  </td>
                  <td className="px-2">{r.results ? <ModeShares hours={r.results.hours} /> : <span className="text-xs text-ink-faint">–</span>}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      {(hasSweepRows || folded.hiddenSweeps > 0) && (
        <p className="mt-2 text-xs text-ink-soft" data-testid="runs-sweep-note">
          Each sweep shows as one row; open it for its points, charts and table.
          {folded.hiddenSweeps > 0 && ` ${folded.hiddenSweeps} older sweep${folded.hiddenSweeps === 1 ? ' is' : 's are'} listed in the Sweeps panel.`}
        </p>
      )}
    </Panel>
  );
}
