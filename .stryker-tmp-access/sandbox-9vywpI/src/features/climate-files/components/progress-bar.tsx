// @ts-nocheck
import type { UploadProgress } from '../api/send-file';

/** Bytes sent of the file, then an indeterminate stripe while the server reads and checks it. */
export function UploadProgressBar({ progress, label, files = 1 }: { progress: UploadProgress; label: string; files?: number }) {
  const what = files > 1 ? `${files} files` : 'the file';
  const pct = progress.totalBytes ? Math.round((100 * progress.sentBytes) / progress.totalBytes) : 0;
  const processing = progress.phase === 'processing';
  return (
    <div className="space-y-1" data-testid="upload-progress">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={processing ? undefined : pct}
        aria-valuetext={processing ? `Sent; the server is reading ${what}` : `${pct} % sent`}
        className="h-2.5 w-full overflow-hidden rounded bg-mist"
      >
        <div className={`h-full bg-harbour-soft transition-[width] ${processing ? 'animate-pulse' : ''}`} style={{ width: `${processing ? 100 : pct}%` }} />
      </div>
      <p className="num text-xs text-ink-soft">
        {processing
          ? `${formatBytes(progress.totalBytes)} sent · the server is reading and checking ${what}…`
          : `${formatBytes(progress.sentBytes)} of ${formatBytes(progress.totalBytes)} sent (${pct} %)${files > 1 ? ` · ${files} files` : ''}`}
      </p>
    </div>
  );
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} kB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}
