// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { Scenario } from '../../../../shared/scenario/schema';

/** One retired input the start-up migration replaced, as the server recorded it. */
export interface ScenarioChange {
  path: string;
  before: unknown;
  after: unknown;
  note: string;
}

export interface StoredScenario {
  id: number;
  projectId: number;
  name: string;
  scenario: Scenario;
  createdAt: string;
  updatedAt: string;
  /** What the start-up migration changed; the editor shows it until an engineer or owner dismisses it. Null if never migrated. */
  migration: { migratedAt: string; changes: ScenarioChange[]; dismissedAt: string | null; dismissedBy: number | null } | null;
}

export const getScenario = (projectId: number, scenarioId: number) => apiFetch<{ scenario: StoredScenario }>(`/projects/${projectId}/scenarios/${scenarioId}`);

export const scenarioQueryOptions = (projectId: number, scenarioId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'scenarios', scenarioId], queryFn: () => getScenario(projectId, scenarioId) });

export const useScenario = (projectId: number, scenarioId: number | null) =>
  useQuery({ ...scenarioQueryOptions(projectId, scenarioId ?? 0), enabled: scenarioId !== null });
