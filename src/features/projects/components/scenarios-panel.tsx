import { Link } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useScenarios } from '@/lib/api/scenarios';

const systemWords: Record<string, string> = {
  'direct-air': 'direct air-side',
  'indirect-air': 'indirect air-side',
  'water-side': 'water-side',
};

export function ScenariosPanel({ projectId, canEdit }: { projectId: number; canEdit: boolean }) {
  const scenarios = useScenarios(projectId);
  return (
    <Panel
      title="Scenarios"
      actions={
        canEdit ? (
          <Link to={`/projects/${projectId}/scenarios/new`} className="rounded border border-rule px-2.5 py-1 text-xs hover:bg-mist">
            New scenario
          </Link>
        ) : undefined
      }
    >
      {scenarios.isPending && <div role="progressbar" className="h-16 animate-pulse rounded bg-mist" aria-label="Loading scenarios" />}
      {scenarios.isError && (
        <Notice tone="bad" title="Scenarios could not be loaded">
          {scenarios.error.message}
        </Notice>
      )}
      {scenarios.data && scenarios.data.scenarios.length === 0 && (
        <p className="text-sm text-ink-soft">
          No scenarios yet.{' '}
          {canEdit ? 'Create one to set the cooling design, setpoints and envelope, then run it on a climate file.' : 'The project’s engineers create them.'}
        </p>
      )}
      {scenarios.data && scenarios.data.scenarios.length > 0 && (
        <ul className="divide-y divide-rule/60 text-sm">
          {scenarios.data.scenarios.map((s) => (
            <li key={s.id} className="flex items-baseline justify-between gap-3 py-1.5">
              <Link to={`/projects/${projectId}/scenarios/${s.id}`} className="font-medium text-harbour underline-offset-2 underline hover:decoration-2">
                {s.name}
              </Link>
              <span className="text-xs text-ink-soft">{systemWords[s.scenario.system?.kind ?? ''] ?? s.scenario.system?.kind ?? ''}</span>
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );
}
