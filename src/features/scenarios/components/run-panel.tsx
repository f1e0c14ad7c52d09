import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Panel } from '@/components/ui/panel';
import { useCreateRuns, type QueuedRun } from '@/lib/api/runs';
import type { ListedClimateFile as ClimateFileListing } from '@/lib/api/climate-files';
import { useScenarios } from '@/lib/api/scenarios';

/**
 * Runs this scenario on the chosen climate files, optionally with other scenarios of the project: every
 * scenario on every file. One run opens its page; a sweep lists its runs and offers to compare them.
 */
export function RunPanel({
  projectId,
  scenarioId,
  climateFiles,
  beforeRun,
}: {
  projectId: number;
  scenarioId: number | null;
  climateFiles: ClimateFileListing[];
  /** Saves unsaved edits first; resolves to the scenario's id, or null when the form is invalid. */
  beforeRun: () => Promise<number | null>;
}) {
  const navigate = useNavigate();
  const createRuns = useCreateRuns(projectId);
  const scenarios = useScenarios(projectId);
  const [fileIds, setFileIds] = useState<number[] | null>(null);
  const [otherIds, setOtherIds] = useState<number[]>([]);
  const [queued, setQueued] = useState<QueuedRun[] | null>(null);
  const chosenFiles = fileIds ?? (climateFiles[0] ? [climateFiles[0].id] : []);
  const others = (scenarios.data?.scenarios ?? []).filter((s) => s.id !== scenarioId);
  const count = chosenFiles.length * (1 + otherIds.length);

  const toggle = (list: number[], id: number) => (list.includes(id) ? list.filter((x) => x !== id) : [...list, id]);

  async function run() {
    setQueued(null);
    const id = await beforeRun();
    if (id === null) return;
    const { runs } = await createRuns.mutateAsync({ scenarioIds: [id, ...otherIds], climateFileIds: chosenFiles });
    if (runs.length === 1) navigate(`/projects/${projectId}/runs/${runs[0].id}`);
    else setQueued(runs);
  }

  return (
    <Panel title="Run">
      {climateFiles.length === 0 ? (
        <p className="text-sm text-ink-soft">A run needs a climate file: upload one to the project first.</p>
      ) : (
        <div className="space-y-3 text-sm">
          <fieldset>
            <legend className="font-medium">On climate files</legend>
            <ul className="mt-1 max-h-40 space-y-1 overflow-auto">
              {climateFiles.map((f) => (
                <li key={f.id}>
                  <label className="flex items-baseline gap-2">
                    <input
                      type="checkbox"
                      className="accent-harbour"
                      checked={chosenFiles.includes(f.id)}
                      onChange={() => setFileIds(toggle(chosenFiles, f.id))}
                    />
                    <span>
                      {f.siteName} · {f.name} <span className="num text-xs text-ink-faint">{f.hours.toLocaleString('en')} h</span>
                    </span>
                  </label>
                </li>
              ))}
            </ul>
          </fieldset>
          {others.length > 0 && (
            <fieldset>
              <legend className="font-medium">With other scenarios (sweep)</legend>
              <ul className="mt-1 max-h-40 space-y-1 overflow-auto">
                {others.map((s) => (
                  <li key={s.id}>
                    <label className="flex items-baseline gap-2">
                      <input
                        type="checkbox"
                        className="accent-harbour"
                        checked={otherIds.includes(s.id)}
                        onChange={() => setOtherIds(toggle(otherIds, s.id))}
                      />
                      <span>{s.name}</span>
                    </label>
                  </li>
                ))}
              </ul>
            </fieldset>
          )}
          <button
            type="button"
            onClick={run}
            disabled={count === 0 || createRuns.isPending}
            className="w-full rounded bg-harbour px-4 py-2 text-paper hover:bg-harbour-soft disabled:opacity-50"
          >
            {createRuns.isPending ? 'Queueing…' : count > 1 ? `Run ${count} combinations` : scenarioId === null ? 'Save and run' : 'Run'}
          </button>
          {scenarioId !== null && (
            <Link className="inline-block text-harbour underline underline-offset-2" to={`/projects/${projectId}/sweeps/new?scenario=${scenarioId}`}>
              Sweep an input of this scenario
            </Link>
          )}
          {createRuns.isError && <p className="text-xs text-signal-bad">The run was not started: {createRuns.error.message}</p>}
          {queued && (
            <div>
              <p className="font-medium">{queued.length} runs queued</p>
              <ul className="mt-1 space-y-0.5">
                {queued.map((r) => (
                  <li key={r.id}>
                    <Link className="text-harbour underline-offset-2 underline hover:decoration-2" to={`/projects/${projectId}/runs/${r.id}`}>
                      Run {r.id}: {r.scenario.name} · {r.climate.name}
                    </Link>
                  </li>
                ))}
              </ul>
              <Link
                className="mt-2 inline-block text-harbour underline underline-offset-2"
                to={`/projects/${projectId}/compare?runs=${queued.map((r) => r.id).join(',')}`}
              >
                Compare these runs
              </Link>
            </div>
          )}
        </div>
      )}
    </Panel>
  );
}
