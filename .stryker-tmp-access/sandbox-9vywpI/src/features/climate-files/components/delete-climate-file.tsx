// @ts-nocheck
import { useState } from 'react';
import { ApiError } from '@/lib/api-client';
import { useDeleteClimateFile } from '../api/delete-climate-file';

/** Delete with a second, explicit confirmation; runs made from the file keep their inputs as run. */
export function DeleteClimateFile({ projectId, fileId, name, onDeleted }: { projectId: number; fileId: number; name: string; onDeleted: () => void }) {
  const [asking, setAsking] = useState(false);
  const remove = useDeleteClimateFile(projectId);
  if (!asking) {
    return (
      <button type="button" onClick={() => setAsking(true)} className="rounded border border-rule bg-panel px-3 py-1.5 text-signal-bad hover:bg-[#fbeceb]">
        Delete…
      </button>
    );
  }
  return (
    <div
      role="alertdialog"
      aria-label="Delete climate file"
      className="flex flex-wrap items-center gap-2 rounded border border-signal-bad/40 bg-[#fbeceb] px-3 py-1.5"
    >
      <span>
        Delete <strong>{name}</strong> and its hours? Runs already made keep their results.
      </span>
      <button
        type="button"
        disabled={remove.isPending}
        onClick={() => remove.mutateAsync(fileId).then(onDeleted, () => undefined)}
        className="rounded bg-signal-bad px-3 py-1 text-paper disabled:opacity-50"
      >
        Delete
      </button>
      <button type="button" onClick={() => setAsking(false)} className="rounded border border-rule bg-panel px-3 py-1">
        Keep it
      </button>
      {remove.isError && (
        <span role="alert" className="w-full text-signal-bad">
          {remove.error instanceof ApiError ? remove.error.message : 'The file could not be deleted.'}
        </span>
      )}
    </div>
  );
}
