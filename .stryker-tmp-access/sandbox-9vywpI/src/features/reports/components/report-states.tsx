// @ts-nocheck
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';

/** A sheet-shaped placeholder while the report loads. */
export function ReportLoading() {
  return <div role="progressbar" className="mx-auto h-[40rem] max-w-[62rem] animate-pulse rounded-md bg-mist" aria-label="Loading report" />;
}

/** Why a report cannot be shown, and what to do about it. */
export function ReportError({ error, what }: { error: Error; what: string }) {
  const status = error instanceof ApiError ? error.status : 0;
  const next =
    status === 409
      ? 'Wait until the run has finished, then open the report again.'
      : status === 404
        ? 'It may have been deleted; open the project to see its runs.'
        : 'Reload the page; if it keeps failing, tell your admin.';
  return (
    <div className="mx-auto max-w-[62rem]">
      <Notice tone="bad" title={`${what} could not be opened`}>
        {error.message} {next}
      </Notice>
    </div>
  );
}
