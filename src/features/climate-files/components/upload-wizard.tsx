import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { ImportReport } from '../../../../shared/climate/types';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { climateFilesQueryKey } from '@/lib/api/climate-files';
import { previewClimateFile, type ClimatePreview } from '../api/preview-climate-file';
import { uploadBytes, type UploadProgress } from '../api/send-file';
import { uploadClimateFile, type RejectedImportDetails } from '../api/upload-climate-file';
import { draftFromDetected, overrideFromDraft, type MappingDraft } from '../lib/mapping-draft';
import { MappingEditor } from './mapping-editor';
import { PreviewTable } from './preview-table';
import { FileStep } from './file-step';
import { UploadProgressBar } from './progress-bar';
import { SiteStep, type RenderNewSite, type WizardSite } from './site-step';
import { FileFormatNote, FileOrigin } from './file-origin';
import { sitePrefillFromHeader } from '../../../../shared/climate/formats/site-check';
import { ValidationReport } from './validation-report';
import { button, quietButton } from '../lib/wizard-buttons';
import type { TimeBasis } from '../../../../shared/schemas/climate-file';

export type { WizardSite };

type Step = 'site' | 'file' | 'mapping' | 'report';
const steps: Array<[Step, string]> = [
  ['site', 'Site'],
  ['file', 'File'],
  ['mapping', 'Mapping and first hours'],
  ['report', 'Report and confirm'],
];

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
  renderNewSite: RenderNewSite;
  onStored: (fileId: number) => void;
}) {
  const queryClient = useQueryClient();
  const [step, setStep] = useState<Step>('site');
  const [siteId, setSiteId] = useState<number | null>(sites.some((s) => s.id === initialSiteId) ? initialSiteId! : sites.length === 1 ? sites[0].id : null);
  const [creatingSite, setCreatingSite] = useState(sites.length === 0);
  const [files, setFiles] = useState<File[]>([]);
  const [name, setName] = useState('');
  const [maxGapHours, setMaxGapHours] = useState(6);
  const [timeBasis, setTimeBasis] = useState<TimeBasis>('site-civil');
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const [preview, setPreview] = useState<ClimatePreview | null>(null);
  const [firstDetected, setFirstDetected] = useState<ClimatePreview['mapping'] | null>(null);
  const [draft, setDraft] = useState<MappingDraft | null>(null);
  const [readDraft, setReadDraft] = useState<string>('');
  const [error, setError] = useState<string | null>(null);
  const [rejected, setRejected] = useState<ImportReport | null>(null);
  const [siteFromHeader, setSiteFromHeader] = useState(false);
  const site = sites.find((s) => s.id === siteId) ?? null;
  const busy = progress !== null;

  const params = (mappingDraft: MappingDraft | null) => ({
    fileName: files[0]?.name ?? 'upload.csv',
    name: name.trim() || undefined,
    maxGapHours,
    timeBasis,
    mapping: mappingDraft ? overrideFromDraft(mappingDraft) : undefined,
    humidityOverIce: mappingDraft?.humidityOverIce ?? false,
  });

  function explain(e: unknown): string {
    if (!(e instanceof ApiError)) return 'Something unexpected went wrong. Try again.';
    if (e.status === 413) return `${e.message} ${files.length > 1 ? 'Send the set in parts' : 'Split the file by period'}, or remove columns it does not need.`;
    if (e.status === 403) return 'Your role in this project lets you read climate files but not add them. Ask an owner for the engineer role.';
    return e.message;
  }

  async function read(mappingDraft: MappingDraft | null, forSiteId = siteId) {
    if (files.length === 0 || !forSiteId) return;
    setError(null);
    setRejected(null);
    setProgress({ sentBytes: 0, totalBytes: uploadBytes(files), phase: 'sending' });
    try {
      const result = await previewClimateFile(projectId, forSiteId, files, params(mappingDraft), setProgress);
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
    if (files.length === 0 || !siteId || !draft) return;
    setError(null);
    setRejected(null);
    setProgress({ sentBytes: 0, totalBytes: uploadBytes(files), phase: 'sending' });
    try {
      const result = await uploadClimateFile(projectId, siteId, files, params(draft), setProgress);
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
        <SiteStep
          sites={sites}
          siteId={siteId}
          setSiteId={setSiteId}
          creatingSite={creatingSite}
          setCreatingSite={setCreatingSite}
          renderNewSite={renderNewSite}
          onContinue={() => setStep('file')}
        />
      )}

      {step === 'file' && (
        <FileStep
          siteName={site?.name ?? 'the site'}
          files={files}
          setFiles={setFiles}
          name={name}
          setName={setName}
          maxGapHours={maxGapHours}
          setMaxGapHours={setMaxGapHours}
          timeBasis={timeBasis}
          setTimeBasis={setTimeBasis}
          siteTimeZone={site?.timeZone ?? 'UTC'}
          progress={progress}
          onBack={() => setStep('site')}
          onRead={() => void read(null)}
        />
      )}

      {step === 'mapping' && preview && draft && (
        <>
          {(preview.mapping.format || preview.report.fileHeader || preview.report.typicalYear) && (
            <Panel title="What the file says about itself">
              <div className="space-y-3">
                <FileFormatNote mapping={preview.mapping} />
                <FileOrigin
                  report={preview.report}
                  site={site ?? undefined}
                  onNewSite={() => setSiteFromHeader(!siteFromHeader)}
                  newSiteOpen={siteFromHeader}
                />
                {siteFromHeader && preview.report.fileHeader && (
                  <div className="rounded border border-rule p-3">
                    <h3 className="mb-2 text-sm font-semibold">New site from the file's header</h3>
                    {renderNewSite((id) => {
                      setSiteFromHeader(false);
                      setSiteId(id);
                      void read(draft, id);
                    }, sitePrefillFromHeader(preview.report.fileHeader))}
                  </div>
                )}
              </div>
            </Panel>
          )}
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
            {progress && (
              <div className="mt-3">
                <UploadProgressBar progress={progress} files={files.length} label={files.length > 1 ? 'Reading the files again' : 'Reading the file again'} />
              </div>
            )}
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
            <button type="button" className={quietButton} onClick={() => setStep('file')} disabled={busy}>
              Back
            </button>
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
          {progress && (
            <UploadProgressBar
              progress={progress}
              files={files.length}
              label={files.length > 1 ? `Storing the ${files.length} files as one climate file` : 'Storing the file'}
            />
          )}
          <div className="flex flex-wrap items-center gap-2">
            <button type="button" className={quietButton} onClick={() => setStep('mapping')} disabled={busy}>
              Back to the mapping
            </button>
            <button type="button" className={button} onClick={() => void store()} disabled={busy || !preview.ok}>
              {files.length > 1 ? `Store ${files.length} files as one climate file` : 'Store climate file'}
            </button>
            {!preview.ok && <span className="text-sm text-signal-bad">Fix the mapping or the file first; nothing is stored while the report has errors.</span>}
          </div>
        </>
      )}
    </div>
  );
}
