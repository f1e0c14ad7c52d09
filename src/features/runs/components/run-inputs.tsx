import { formatQuantity } from '@/lib/quantity';
import { standardPeriod, utcOffsetLabel } from '../../../../shared/time-zone';
import { useUnitSystem } from '@/lib/unit-system';
import type { RunRecord } from '@/lib/api/runs';
import { scenarioInputRows } from '../../../../shared/report/inputs';
import { formatInputValue } from '@/lib/input-value';
import { inputLabel } from '../../../../shared/scenario/input-labels';
import { humidityReadingWords } from '../../../../shared/report/humidity-reading';

/** Everything the run was computed from, exactly as stored with it: scenario, climate file, engine. */
export function RunInputs({ run }: { run: RunRecord }) {
  const { unitSystem } = useUnitSystem();
  const rows = scenarioInputRows(run.scenario);
  const c = run.climate;
  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
      <table className="w-full text-xs" data-testid="run-inputs">
        <caption className="pb-1 text-left text-ink-soft">Scenario as run (each input with its field name in the scenario JSON)</caption>
        <tbody>
          {rows.map((r) => (
            <tr key={r.path} className="border-b border-rule/60">
              <th scope="row" className="py-0.5 pr-4 text-left font-normal">
                {inputLabel(r.path)} <span className="num text-[10px] text-ink-soft">{r.path}</span>
              </th>
              <td className="num py-0.5 text-right">{formatInputValue(r, unitSystem)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <dl className="grid h-min grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-xs" data-testid="run-climate">
        <dt className="text-ink-soft">Climate file</dt>
        <dd>{c.name}</dd>
        <dt className="text-ink-soft">Site</dt>
        <dd>
          {c.site.name}, {formatQuantity('elevation', unitSystem, c.elevationM)}, {c.site.timeZone}
        </dd>
        <dt className="text-ink-soft">Hours</dt>
        <dd className="num">
          {c.hours.toLocaleString('en')} ({standardPeriod(c.firstHourMs, c.lastHourMs, c.utcOffsetMinutes)}, site standard time{' '}
          {utcOffsetLabel(c.utcOffsetMinutes)})
        </dd>
        <dt className="text-ink-soft">File checksum</dt>
        <dd className="num break-all">sha256 {c.sha256}</dd>
        <dt className="text-ink-soft">Engine version</dt>
        <dd className="num">{run.engineVersion}</dd>
        <dt className="text-ink-soft">Elevation used</dt>
        <dd>
          {run.results ? formatQuantity('elevation', unitSystem, run.results.site.elevationM) : '–'}
          <span className="block text-ink-faint">the site's; it takes the place of the scenario's elevationM</span>
        </dd>
        <dt className="text-ink-soft">Humidity in the file</dt>
        <dd data-testid="run-humidity-reading">{humidityReadingWords(c.humidityOverIce)}</dd>
        <dt className="text-ink-soft">Pressure</dt>
        <dd>{run.results?.site.pressureSource === 'weather' ? 'station pressure from the file' : 'standard atmosphere at the site elevation'}</dd>
      </dl>
    </div>
  );
}
