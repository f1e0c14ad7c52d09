import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { Scenario } from '../../../../shared/scenario/schema';
import type { ScenarioPreview } from '../../../../shared/schemas/api/scenarios';
export type { ScenarioPreview } from '../../../../shared/schemas/api/scenarios';

/** Hours per mode for an unsaved scenario on one climate file; computed on the server, never stored. */
export const previewScenario = (projectId: number, climateFileId: number, scenario: Scenario, signal?: AbortSignal) =>
  apiFetch<ScenarioPreview>(`/projects/${projectId}/scenarios/preview`, {
    method: 'POST',
    body: JSON.stringify({ scenario, climateFileId }),
    signal,
  });

/**
 * The query's signal aborts the request when the key moves on (the scenario was edited again) or the
 * editor closes, so a slow answer for an old scenario never lands over a newer one.
 */
export const scenarioPreviewQueryOptions = (projectId: number, climateFileId: number | null, scenario: Scenario | null) =>
  queryOptions({
    queryKey: ['projects', projectId, 'scenario-preview', climateFileId, scenario],
    queryFn: ({ signal }) => previewScenario(projectId, climateFileId!, scenario!, signal),
    enabled: climateFileId !== null && scenario !== null,
    placeholderData: keepPreviousData,
    staleTime: 60_000,
    retry: false,
  });

export const useScenarioPreview = (projectId: number, climateFileId: number | null, scenario: Scenario | null) =>
  useQuery(scenarioPreviewQueryOptions(projectId, climateFileId, scenario));
