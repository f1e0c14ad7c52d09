import { ScenarioEditorPage } from '@/features/scenarios/components/scenario-editor-page';

/** /projects/:projectId/scenarios/new and /projects/:projectId/scenarios/:scenarioId — the scenario editor. */
export function ScenarioEditorRoute() {
  return <ScenarioEditorPage />;
}
