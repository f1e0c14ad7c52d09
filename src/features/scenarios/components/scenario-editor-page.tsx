import { useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { useClimateFiles } from '@/lib/api/climate-files';
import { useProjectRole } from '@/lib/api/projects';
import { useScenario } from '../api/get-scenario';
import { newScenarioValues, toFormValues } from '../lib/scenario-form';
import { ScenarioForm } from './scenario-form';
import { MigrationNotice } from './migration-notice';

/** /projects/:projectId/scenarios/new and /projects/:projectId/scenarios/:scenarioId */
export function ScenarioEditorPage() {
  const params = useParams();
  const projectId = Number(params.projectId);
  const scenarioId = params.scenarioId ? Number(params.scenarioId) : null;
  const scenario = useScenario(projectId, scenarioId);
  const climateFiles = useClimateFiles(projectId);
  const { canEdit, role } = useProjectRole(projectId);

  if (scenarioId !== null && scenario.isPending) {
    return <div role="progressbar" className="h-96 animate-pulse rounded-md bg-mist" aria-label="Loading scenario" />;
  }
  if (scenario.isError) {
    return (
      <Notice tone="bad" title="This scenario could not be opened">
        {scenario.error.message} Go back to the project and pick it again.
      </Notice>
    );
  }
  const stored = scenario.data?.scenario;
  return (
    <ScenarioForm
      key={stored?.id ?? 'new'}
      projectId={projectId}
      scenarioId={stored?.id ?? null}
      initial={stored ? toFormValues(stored.scenario) : newScenarioValues}
      climateFiles={climateFiles.data?.climateFiles ?? []}
      canEdit={role === undefined ? false : canEdit}
      roleKnown={role !== undefined}
      notice={stored && <MigrationNotice projectId={projectId} stored={stored} canDismiss={role !== undefined && canEdit} />}
    />
  );
}
