import { useQueryClient } from '@tanstack/react-query';
import { useId, useState, type ReactNode } from 'react';
import type { ImportReport } from '../../../../shared/climate/types';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { climateFilesQueryKey } from '../api/get-climate-files';
import { previewClimateFile, type ClimatePreview } from '../api/preview-climate-file';
import type { UploadProgress } from '../api/send-file';
import { uploadClimateFile, type RejectedImportDetails } from '../api/upload-climate-file';
import { draftFromDetected, overrideFromDraft, type MappingDraft } from '../lib/mapping-draft';
import { MappingEditor } from './mapping-editor';
import { PreviewTable } from './preview-table';
import { UploadProgressBar, formatBytes } from './progress-bar';
import { ValidationReport } from './validation-report';

export interface WizardSite {
  id: number;
  name: string;
  elevationM: number;
  timeZone: string;
}

type Step = 'site' | 'file' | 'mapping' | 'report';
const steps: Array<[Step, string]> = [
  ['site', 'Site'],
  ['file', 'File'],
  ['mapping', 'Mapping and first hours'],
  ['report', 'Report and confirm'],
];

const button = 'rounded bg-harbour px-4 py-2 text-sm text-paper hover:bg-harbour-soft disabled:cursor-not-allowed disabled:opacity-50';
const quietButton = 'rounded border border-rule bg-panel px-4 py-2 text-sm hover:bg-mist';

/**
 * Upload of an hourly weather file in four steps: the site, the file (sent with a progress bar and
 * read on the server without storing), the mapping with the first hours as read, then the
 * validation report and confirmation. Nothing is stored before the last step.
 */
export function UploadWizard({
  projectId,
  sites,
  renderNewSite,
  onStored,
  initialSiteId,
}: {
  projectId: number;
  sites: WizardSite[];
  /** A site chosen before the wizard opened (from a site's page). */
  initialSiteId?: number;
  /** The form that creates a site; it calls back with the new site's id. */
  renderNewSite: (onCreated: (siteId: number) => void) => ReactNode;
  onStored: (fileId: number) => void;
}) {
  const queryClient = useQueryClient();
  const { unitSystem } = useUnitSystem();
  const ids = useId();
  const [step, setStep] = useState<Step>('site');
  const [siteId, setSiteId] = useState<number | null>(
    sites.some((s) => s.id === initialSiteId) ? initialSiteId! : sites.length === 1 ? sites[0].id : null,
  );
  const [creatingSite, setCreatingSite] = useState(sites.length === 0);
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState('');
  const [maxGapHours, setMaxGapHours] = useState(6);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [preview, setPreview] = useState<ClimatePreview | null>(null);
  const [firstDetected, setFirstDetected] = useState<ClimatePreview['mapping'] | null>(null);
  const [draft, setDraft] = useState<MappingDraft | null>(null);
  const [readDraft, setReadDraft] = useState<string>('');
  const [error, setError] = useState<string | null>(null);
  const [rejected, setRejected] = useState<ImportReport | null>(null);
  const site = sites.find((s) => s.id === siteId) ?? null;
  const busy = progress !== null;
  const gapValid = Number.isInteger(maxGapHours) && maxGapHours >= 0 && maxGapHours <= 168;

  const params = (mappingDraft: MappingDraft | null) => ({
    fileName: file?.name ?? 'upload.csv',
    name: name.trim() || undefined,
    maxGapHours,
    mapping: mappingDraft ? overrideFromDraft(mappingDraft) : undefined,
  });

  function explain(e: unknown): string {
    if (!(e instanceof ApiError)) return 'Something unexpected went wrong. Try again.';
    if (e.status === 413) return `${e.message} Split the file by period, or remove columns it does not need.`;
    if (e.status === 403) return 'Your role in this project lets you read climate files but not add them. Ask an owner for the engineer role.';
    return e.message;
  }

  async function read(mappingDraft: MappingDraft | null) {
    if (!file || !siteId) return;
    setError(null);
    setRejected(null);
    setProgress({ sentBytes: 0, totalBytes: file.size, phase: 'sending' });
    try {
      const result = await previewClimateFile(projectId, siteId, file, params(mappingDraft), setProgress);
      setPreview(result);
      if (!mappingDraft) setFirstDetected(result.mapping);
      const next = mappingDraft ?? draftFromDetected(result.mapping);
      setDraft(next);
      setReadDraft(JSON.stringify(next));
      setStep('mapping');
    } catch (e) {
      setError(explain(e));
    } finally {
      setProgress(null);
    }
  }

  async function store() {
    if (!file || !siteId || !draft) return;
    setError(null);
    setRejected(null);
    setProgress({ sentBytes: 0, totalBytes: file.size, phase: 'sending' });
    try {
      const result = await uploadClimateFile(projectId, siteId, file, params(draft), setProgress);
      await queryClient.invalidateQueries({ queryKey: climateFilesQueryKey(projectId) });
      onStored(result.climateFile.id);
    } catch (e) {
      if (e instanceof ApiError && e.status === 422 && (e.details as RejectedImportDetails | undefined)?.report) {
        setRejected((e.details as RejectedImportDetails).report);
        setError('The server refused the file; nothing was stored. The report below says why.');
      } else setError(explain(e));
    } finally {
      setProgress(null);
    }
  }

  const stale = draft !== null && JSON.stringify(draft) !== readDraft;
  const current = steps.findIndex(([s]) => s === step);

  return (
    <div className="space-y-4">
      <ol aria-label="Upload steps" className="flex flex-wrap gap-2 text-sm">
        {steps.map(([key, label], k) => (
          <li
            key={key}
            aria-current={k === current ? 'step' : undefined}
            className={`rounded-full border px-3 py-1 ${k === current ? 'border-harbour bg-harbour text-paper' : k < current ? 'border-rule bg-mist text-ink' : 'border-rule text-ink-faint'}`}
          >
            <span className="num mr-1">{k + 1}</span>
            {label}
          </li>
        ))}
      </ol>

      {error && (
        <Notice tone="bad" title="That did not work">
          {error}
        </Notice>
      )}

      {step === 'site' && (
        <Panel title="Which site is this weather for?">
          <div className="space-y-4">
            <p className="text-sm text-ink-soft">
              The site's elevation sets the pressure when the file has none, and its time zone reads local timestamps.
            </p>
            {sites.length > 0 && (
              <fieldset className="space-y-1">
                <legend className="sr-only">Site</legend>
                {sites.map((s) => (
                  <label key={s.id} className="flex cursor-pointer items-center gap-3 rounded border border-rule px-3 py-2 hover:bg-mist has-[:checked]:border-harbour has-[:checked]:bg-mist">
                    <input type="radio" name={`${ids}-site`} value={s.id} checked={siteId === s.id} onChange={() => setSiteId(s.id)} />
                    <span className="font-medium">{s.name}</span>
                    <span className="num text-xs text-ink-soft">
                      {formatQuantity('elevation', unitSystem, s.elevationM)} · {s.timeZone}
                    </span>
                  </label>
                ))}
              </fieldset>
            )}
            {creatingSite ? (
              <div className="rounded border border-rule p-3">
                <h3 className="mb-2 text-sm font-semibold">New site</h3>
                {renderNewSite((id) => {
                  setSiteId(id);
                  setCreatingSite(false);
                })}
              </div>
            ) : (
              <button type="button" className={quietButton} onClick={() => setCreatingSite(true)}>
                Add a new site
              </button>
            )}
            <div>
              <button type="button" className={button} disabled={!siteId} onClick={() => setStep('file')}>
                Continue with {site ? site.name : 'the chosen site'}
              </button>
            </div>
          </div>
        </Panel>
      )}

      {step === 'file' && (
        <Panel title={`Hourly weather for ${site?.name ?? 'the site'}`}>
          <form
            className="space-y-4"
            onSubmit={(e) => {
              e.preventDefault();
              void read(null);
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
            {file && <p className="num text-xs text-ink-soft">{file.name} · {formatBytes(file.size)}</p>}
            {progress && <UploadProgressBar progress={progress} label="Reading the file" />}
            <div className="flex gap-2">
              <button type="button" className={quietButton} onClick={() => setStep('site')} disabled={busy}>Back</button>
              <button type="submit" className={button} disabled={!file || busy || !gapValid}>Read the file</button>
            </div>
          </form>
        </Panel>
      )}

      {step === 'mapping' && preview && draft && (
        <>
          <Panel title="How the columns were read">
            <p className="mb-2 text-sm text-ink-soft">
              Check each column and unit; change any that is wrong, then read the file again to see the effect below.
            </p>
            <MappingEditor detected={preview.mapping} firstDetected={firstDetected ?? preview.mapping} draft={draft} onChange={setDraft} />
            <div className="mt-3 flex flex-wrap items-center gap-2">
              <button type="button" className={stale ? button : quietButton} disabled={busy} onClick={() => void read(draft)}>
                Read again with these choices
              </button>
              {stale && <span className="text-xs text-signal-warn">Changed: the hours below still show the previous reading.</span>}
            </div>
            {progress && <div className="mt-3"><UploadProgressBar progress={progress} label="Reading the file again" /></div>}
          </Panel>
          <Panel title="The first hours as interpreted">
            {preview.humidityKind ? (
              <PreviewTable
                hours={preview.preview}
                humidityKind={preview.humidityKind}
                hasPressure={preview.preview.some((h) => h.pressurePa !== null)}
                firstLines={preview.firstLines}
                timeZone={site?.timeZone ?? 'UTC'}
              />
            ) : (
              <Notice tone="warn" title="No hours could be read yet">
                Choose the time, dry-bulb and humidity columns above, then read the file again.
              </Notice>
            )}
          </Panel>
          <div className="flex gap-2">
            <button type="button" className={quietButton} onClick={() => setStep('file')} disabled={busy}>Back</button>
            <button type="button" className={button} onClick={() => setStep('report')} disabled={busy || stale}>
              Continue to the report
            </button>
          </div>
        </>
      )}

      {step === 'report' && preview && (
        <>
          <Panel title="Validation report">
            <ValidationReport report={rejected ?? preview.report} />
          </Panel>
          {progress && <UploadProgressBar progress={progress} label="Storing the file" />}
          <div className="flex flex-wrap items-center gap-2">
            <button type="button" className={quietButton} onClick={() => setStep('mapping')} disabled={busy}>Back to the mapping</button>
            <button type="button" className={button} onClick={() => void store()} disabled={busy || !preview.ok}>
              Store climate file
            </button>
            {!preview.ok && <span className="text-sm text-signal-bad">Fix the mapping or the file first; nothing is stored while the report has errors.</span>}
          </div>
        </>
      )}
    </div>
  );
}
