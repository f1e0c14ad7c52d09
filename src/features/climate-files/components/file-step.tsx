import { useId } from 'react';
import { Panel } from '@/components/ui/panel';
import type { UploadProgress } from '../api/send-file';
import type { TimeBasis } from '../../../../shared/schemas/climate-file';
import { UploadProgressBar, formatBytes } from './progress-bar';
import { button, quietButton } from './wizard-buttons';

/** Step 2: the file, its name in the project, the longest gap to fill and the clock its times are on; reading it sends it with a progress bar. */
export function FileStep({
  siteName,
  file,
  setFile,
  name,
  setName,
  maxGapHours,
  setMaxGapHours,
  timeBasis,
  setTimeBasis,
  siteTimeZone,
  progress,
  onBack,
  onRead,
}: {
  siteName: string;
  file: File | null;
  setFile: (file: File | null) => void;
  name: string;
  setName: (name: string) => void;
  maxGapHours: number;
  setMaxGapHours: (hours: number) => void;
  timeBasis: TimeBasis;
  setTimeBasis: (basis: TimeBasis) => void;
  siteTimeZone: string;
  progress: UploadProgress | null;
  onBack: () => void;
  onRead: () => void;
}) {
  const ids = useId();
  const busy = progress !== null;
  const gapValid = Number.isInteger(maxGapHours) && maxGapHours >= 0 && maxGapHours <= 168;
  return (
    <Panel title={`Hourly weather for ${siteName}`}>
      <form
        className="space-y-4"
        onSubmit={(e) => {
          e.preventDefault();
          if (gapValid) onRead();
        }}
      >
        <div className="space-y-1">
          <label htmlFor={`${ids}-file`} className="block text-sm font-medium">File</label>
          <input
            id={`${ids}-file`}
            type="file"
            accept=".csv,.tsv,.txt,text/csv,text/plain"
            className="block text-sm file:mr-3 file:rounded file:border file:border-rule file:bg-panel file:px-3 file:py-1.5"
            onChange={(e) => {
              const chosen = e.target.files?.[0] ?? null;
              setFile(chosen);
              if (chosen && !name) setName(chosen.name.replace(/\.[^.]+$/, ''));
            }}
          />
          <p className="text-xs text-ink-soft">
            Comma, semicolon or tab separated text; decimal point or comma; one time column, date and time columns, or year/month/day/hour columns. Up to 64 MB.
          </p>
        </div>
        <div className="grid gap-4 sm:grid-cols-2">
          <div className="space-y-1">
            <label htmlFor={`${ids}-name`} className="block text-sm font-medium">Name in the project</label>
            <input id={`${ids}-name`} className="w-full rounded border border-rule bg-panel px-2 py-1.5 text-sm" maxLength={120} value={name} onChange={(e) => setName(e.target.value)} />
          </div>
          <div className="space-y-1">
            <label htmlFor={`${ids}-gap`} className="block text-sm font-medium">Fill gaps up to (hours)</label>
            <input
              id={`${ids}-gap`}
              type="number"
              min={0}
              max={168}
              step={1}
              className="num w-32 rounded border border-rule bg-panel px-2 py-1.5 text-sm"
              value={Number.isNaN(maxGapHours) ? '' : maxGapHours}
              onChange={(e) => setMaxGapHours(e.target.valueAsNumber)}
              aria-describedby={`${ids}-gap-help`}
              aria-invalid={!gapValid}
            />
            <p id={`${ids}-gap-help`} className={`text-xs ${gapValid ? 'text-ink-soft' : 'text-signal-bad'}`}>
              {gapValid ? 'Shorter gaps are filled by linear interpolation and marked; longer ones stay missing.' : 'Enter a whole number of hours from 0 to 168.'}
            </p>
          </div>
        </div>
        <div className="space-y-1">
          <label htmlFor={`${ids}-basis`} className="block text-sm font-medium">Times written without a UTC offset are</label>
          <select
            id={`${ids}-basis`}
            className="rounded border border-rule bg-panel px-2 py-1.5 text-sm"
            value={timeBasis}
            onChange={(e) => setTimeBasis(e.target.value as TimeBasis)}
          >
            <option value="site-civil">the site's clock time, with daylight saving ({siteTimeZone})</option>
            <option value="site-standard">the site's standard time all year, no daylight saving</option>
            <option value="utc">UTC</option>
          </select>
          <p className="text-xs text-ink-soft">Many weather files are written in local standard time all year; loggers often follow the wall clock. Times that carry an offset or Z are read as written.</p>
        </div>
        {file && <p className="num text-xs text-ink-soft">{file.name} · {formatBytes(file.size)}</p>}
        {progress && <UploadProgressBar progress={progress} label="Reading the file" />}
        <div className="flex gap-2">
          <button type="button" className={quietButton} onClick={onBack} disabled={busy}>Back</button>
          <button type="submit" className={button} disabled={!file || busy || !gapValid}>Read the file</button>
        </div>
      </form>
    </Panel>
  );
}
