import { useId } from 'react';
import { Panel } from '@/components/ui/panel';
import type { UploadProgress } from '../api/send-file';
import type { TimeBasis } from '../../../../shared/schemas/climate-file';
import { UploadProgressBar, formatBytes } from './progress-bar';
import { button, quietButton } from '../lib/wizard-buttons';

/** Step 2: the file, its name in the project, the longest gap to fill and the clock its times are on; reading it sends it with a progress bar. */
export function FileStep({
  siteName,
  files,
  setFiles,
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
  files: File[];
  setFiles: (files: File[]) => void;
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
          <label htmlFor={`${ids}-file`} className="block text-sm font-medium">
            File
          </label>
          <input
            id={`${ids}-file`}
            type="file"
            multiple
            accept=".csv,.tsv,.txt,.epw,.dat,text/csv,text/plain"
            className="block text-sm file:mr-3 file:rounded file:border file:border-rule file:bg-panel file:px-3 file:py-1.5"
            onChange={(e) => {
              const chosen = Array.from(e.target.files ?? []).sort((a, b) => a.name.localeCompare(b.name, 'en', { numeric: true }));
              setFiles(chosen);
              if (chosen.length > 0 && !name) setName(setNameOf(chosen));
            }}
          />
          <p className="text-xs text-ink-soft">
            Comma, semicolon or tab separated text, EPW, or fixed-width station records; one time column, date and time columns, or year/month/day/hour columns.
            Choose several files (thirty yearly files, twelve monthly ones) to read them as one climate file: they must share one layout and are joined in time
            order. Up to 64 MB in all.
          </p>
        </div>
        <div className="grid gap-4 sm:grid-cols-2">
          <div className="space-y-1">
            <label htmlFor={`${ids}-name`} className="block text-sm font-medium">
              Name in the project
            </label>
            <input
              id={`${ids}-name`}
              className="w-full rounded border border-rule bg-panel px-2 py-1.5 text-sm"
              maxLength={120}
              value={name}
              onChange={(e) => setName(e.target.value)}
            />
          </div>
          <div className="space-y-1">
            <label htmlFor={`${ids}-gap`} className="block text-sm font-medium">
              Fill gaps up to (hours)
            </label>
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
              {gapValid
                ? 'Shorter gaps are filled by linear interpolation and marked; longer ones stay missing.'
                : 'Enter a whole number of hours from 0 to 168.'}
            </p>
          </div>
        </div>
        <div className="space-y-1">
          <label htmlFor={`${ids}-basis`} className="block text-sm font-medium">
            Times written without a UTC offset are
          </label>
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
          <p className="text-xs text-ink-soft">
            Many weather files are written in local standard time all year; loggers often follow the wall clock. Times that carry an offset or Z are read as
            written.
          </p>
        </div>
        {files.length === 1 && (
          <p className="num text-xs text-ink-soft">
            {files[0].name} · {formatBytes(files[0].size)}
          </p>
        )}
        {files.length > 1 && <ChosenFiles files={files} />}
        {progress && (
          <UploadProgressBar progress={progress} files={files.length} label={files.length > 1 ? `Reading ${files.length} files` : 'Reading the file'} />
        )}
        <div className="flex gap-2">
          <button type="button" className={quietButton} onClick={onBack} disabled={busy}>
            Back
          </button>
          <button type="submit" className={button} disabled={files.length === 0 || busy || !gapValid}>
            {files.length > 1 ? `Read the ${files.length} files` : 'Read the file'}
          </button>
        </div>
      </form>
    </Panel>
  );
}

/** "2019–2021 (3 files)" for a set, the bare name for one file: the name the server would give it. */
function setNameOf(files: File[]): string {
  const bare = files.map((f) => f.name.replace(/\.[^.]+$/, ''));
  return bare.length === 1 ? bare[0] : `${bare[0]}–${bare[bare.length - 1]} (${bare.length} files)`;
}

/** The files chosen for one climate file, with their sizes and the total. */
function ChosenFiles({ files }: { files: File[] }) {
  const total = files.reduce((sum, f) => sum + f.size, 0);
  return (
    <div className="text-xs" data-testid="chosen-files">
      <p className="text-ink-soft">
        {files.length} files, {formatBytes(total)} in all, read as one climate file (joined in time order on the server):
      </p>
      <ul className="num mt-1 max-h-40 columns-2 overflow-y-auto text-ink-soft sm:columns-3">
        {files.map((f) => (
          <li key={f.name}>
            {f.name} · {formatBytes(f.size)}
          </li>
        ))}
      </ul>
    </div>
  );
}
