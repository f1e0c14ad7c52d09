import { Notice } from '@/components/ui/notice';
import { formatInputValue } from '@/lib/input-value';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import { kindOfKey } from '../../../../shared/report/inputs';
import { inputLabel } from '../../../../shared/scenario/input-labels';
import { useDismissMigrationNotice } from '../api/dismiss-migration-notice';
import type { StoredScenario } from '../api/get-scenario';

/** A value before or after the migration, in the reader's units where its field name gives one. */
function changeValue(path: string, value: unknown, system: UnitSystem, missing: string): string {
  if (value === undefined || value === null) return missing;
  if (typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean') {
    const key = path.split('.').pop() ?? path;
    return formatInputValue({ path, value, kind: typeof value === 'number' ? kindOfKey(key) : 'plain' }, system);
  }
  return JSON.stringify(value);
}

/**
 * What the start-up migration changed in this saved scenario (retired inputs replaced), shown on the editor until an
 * engineer or owner dismisses it. Runs made before keep the inputs they were made with.
 */
export function MigrationNotice({ projectId, stored, canDismiss }: { projectId: number; stored: StoredScenario; canDismiss: boolean }) {
  const { unitSystem } = useUnitSystem();
  const dismiss = useDismissMigrationNotice(projectId, stored.id);
  const migration = stored.migration;
  if (!migration || migration.dismissedAt) return null;
  return (
    <div data-testid="migration-notice">
      <Notice tone="warn" title="This scenario was brought up to date with the current engine">
        <p>
          Some inputs it was saved with are no longer used. They were replaced as listed below on {migration.migratedAt.slice(0, 10)}. Check the new values
          before you run it again; runs made before keep the inputs they were made with.
        </p>
        <table className="mt-2 w-full text-xs">
          <thead>
            <tr className="border-b border-rule text-left text-ink-soft">
              <th scope="col" className="py-1 pr-3 font-medium">
                Input
              </th>
              <th scope="col" className="py-1 pr-3 font-medium">
                Before
              </th>
              <th scope="col" className="py-1 pr-3 font-medium">
                Now
              </th>
              <th scope="col" className="py-1 font-medium">
                Why
              </th>
            </tr>
          </thead>
          <tbody>
            {migration.changes.map((c, i) => (
              <tr key={`${c.path}-${i}`} className="border-b border-rule/60 align-top text-ink">
                <th scope="row" className="py-1 pr-3 text-left font-normal">
                  {inputLabel(c.path)}
                  <span className="block font-mono text-[11px] text-ink-faint">{c.path}</span>
                </th>
                <td className="num py-1 pr-3">{changeValue(c.path, c.before, unitSystem, 'not set')}</td>
                <td className="num py-1 pr-3">{changeValue(c.path, c.after, unitSystem, 'removed')}</td>
                <td className="py-1">{c.note}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <div className="mt-2 flex items-center gap-3">
          {canDismiss ? (
            <button
              type="button"
              className="rounded border border-rule bg-panel px-3 py-1 text-xs text-ink hover:bg-mist disabled:opacity-60"
              disabled={dismiss.isPending}
              onClick={() => dismiss.mutate()}
            >
              {dismiss.isPending ? 'Dismissing…' : 'I have checked these: dismiss'}
            </button>
          ) : (
            <span className="text-xs">An engineer or owner of the project dismisses this notice once they have checked the changes.</span>
          )}
          {dismiss.isError && <span className="text-xs text-signal-bad">{dismiss.error.message}</span>}
        </div>
      </Notice>
    </div>
  );
}
