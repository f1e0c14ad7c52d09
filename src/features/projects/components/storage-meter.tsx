import { BYTES_PER_MB, type ProjectStorage } from '../../../../shared/schemas/project-storage';
import { useProjectStorage } from '@/lib/api/projects';

/** Decimal units, as the limit is set (MB of 1,000,000 bytes): kB below 1 MB, one decimal below 100 of a unit. */
function mb(bytes: number): string {
  const [value, unit] = bytes < BYTES_PER_MB ? [bytes / 1_000, 'kB'] : [bytes / BYTES_PER_MB, 'MB'];
  return `${value.toLocaleString('en', { maximumFractionDigits: value < 100 ? 1 : 0 })} ${unit}`;
}

/** Share of the limit from which the meter warns that the project is nearly full. */
const NEARLY_FULL = 0.9;

/** What the project stores against its limit, with what holds the bytes. */
export function StorageMeter({ projectId }: { projectId: number }) {
  const storage = useProjectStorage(projectId);
  if (!storage.data) return null;
  return <StorageMeterView storage={storage.data.storage} />;
}

function StorageMeterView({ storage: s }: { storage: ProjectStorage }) {
  const share = Math.min(1, s.usedBytes / s.limitBytes);
  const nearlyFull = share >= NEARLY_FULL;
  const parts: Array<[string, number]> = [
    ['climate files', s.climateFileBytes],
    ['run hours', s.runBytes],
    ['queued runs (estimated)', s.pendingRunBytes],
    ['issue lists', s.issueListBytes],
  ];
  return (
    <div className="w-64 rounded border border-rule bg-panel px-3 py-2 text-xs text-ink-soft" data-testid="storage-meter">
      <p className="flex justify-between gap-2">
        <span>Storage</span>
        <span className={`num ${nearlyFull ? 'font-semibold text-signal-warn' : 'text-ink'}`}>
          {mb(s.usedBytes)} of {mb(s.limitBytes)} ({Math.round(share * 100)} %)
        </span>
      </p>
      <div
        className="mt-1 h-1.5 overflow-hidden rounded bg-mist"
        role="meter"
        aria-label="Storage used"
        aria-valuemin={0}
        aria-valuemax={s.limitBytes}
        aria-valuenow={s.usedBytes}
        aria-valuetext={`${mb(s.usedBytes)} of ${mb(s.limitBytes)}`}
      >
        <div className={`h-full ${nearlyFull ? 'bg-signal-warn' : 'bg-harbour-soft'}`} style={{ width: `${share * 100}%` }} />
      </div>
      <p className="mt-1">
        {parts
          .filter(([, bytes]) => bytes > 0)
          .map(([label, bytes]) => `${label} ${mb(bytes)}`)
          .join(' · ') || 'nothing stored yet'}
        {nearlyFull && '. Nearly full: delete runs or files no longer needed, or ask the administrator to raise the limit.'}
      </p>
    </div>
  );
}
