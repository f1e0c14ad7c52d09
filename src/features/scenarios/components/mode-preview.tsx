import { useId } from 'react';
import { hoursOfMode, modeKeys, modeLabels } from '../../../../shared/modes';
import { LoopHoursTable } from '@/components/ui/loop-hours-table';
import { ModeShareBar, ModeSwatch } from '@/components/ui/mode-marks';
import type { Scenario } from '../../../../shared/scenario/schema';
import { useScenarioPreview } from '../api/preview-scenario';
import type { ListedClimateFile as ClimateFileListing } from '@/lib/api/climate-files';

/** Hours per mode for the scenario as it stands in the editor, on one climate file, refreshed as it changes. */
export function ModePreview({
  projectId,
  scenario,
  invalid,
  climateFiles,
  climateFileId,
  onClimateFileChange,
}: {
  projectId: number;
  scenario: Scenario | null;
  invalid: boolean;
  climateFiles: ClimateFileListing[];
  climateFileId: number | null;
  onClimateFileChange: (id: number) => void;
}) {
  const id = useId();
  const preview = useScenarioPreview(projectId, climateFileId, scenario);
  const hours = preview.data?.hours;
  const total = hours ? hours.total : 0;
  return (
    <div className="space-y-3" aria-busy={preview.isFetching}>
      <div className="flex items-center gap-2">
        <label htmlFor={id} className="text-sm">
          Climate file
        </label>
        <select
          id={id}
          value={climateFileId ?? ''}
          onChange={(e) => onClimateFileChange(Number(e.target.value))}
          className="min-w-0 flex-1 rounded border border-rule bg-panel px-2 py-1 text-sm"
        >
          {climateFiles.map((f) => (
            <option key={f.id} value={f.id}>
              {f.siteName} · {f.name}
            </option>
          ))}
        </select>
      </div>
      {invalid && <p className="text-xs text-signal-warn">The preview waits until every field is valid.</p>}
      {preview.isError && <p className="text-xs text-signal-bad">Preview failed: {preview.error.message}</p>}
      {!hours && preview.isFetching && <div role="progressbar" className="h-20 animate-pulse rounded bg-mist" aria-label="Computing preview" />}
      {hours && (
        <div className={preview.isFetching || invalid ? 'opacity-40 transition-opacity' : ''} data-testid="mode-preview" aria-disabled={invalid || undefined}>
          <ModeShareBar hours={hours} />
          <table className="mt-2 w-full text-sm">
            <caption className="sr-only">Preview of hours per mode</caption>
            <tbody>
              {modeKeys.map((key) => (
                <tr key={key} className="border-b border-rule/60 last:border-0">
                  <th scope="row" className="py-1 text-left font-normal">
                    <ModeSwatch mode={key} className="mr-2 size-2.5 align-middle" />
                    {modeLabels[key]}
                  </th>
                  <td className="num py-1 text-right">{hoursOfMode(hours, key).toLocaleString('en')} h</td>
                  <td className="num w-16 py-1 text-right text-ink-soft">{total ? ((100 * hoursOfMode(hours, key)) / total).toFixed(1) : '0.0'} %</td>
                </tr>
              ))}
            </tbody>
          </table>
          {preview.data?.loops && scenario?.system.kind === 'hybrid' && (
            <div className="mt-3">
              <LoopHoursTable
                hall={hours}
                liquid={preview.data.loops.liquid.hours}
                air={preview.data.loops.air.hours}
                liquidShare={scenario.system.liquidShare}
              />
            </div>
          )}
          <p className="num mt-1 text-xs text-ink-soft">
            {total.toLocaleString('en')} h · pPUE {preview.data?.energy.partialPue?.toFixed(3) ?? '–'}
            {preview.isFetching && ' · updating…'}
          </p>
        </div>
      )}
    </div>
  );
}
