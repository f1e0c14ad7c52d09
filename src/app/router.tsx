import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppShell } from '@/components/layout/app-shell';
import { HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';
import { RouteError } from './routes/route-error';

const router = createBrowserRouter([
  {
    element: <AppShell />,
    errorElement: <RouteError />,
    children: [
      { index: true, element: <HomeRoute /> },
      // Scenarios, runs, comparison, envelopes and the state calculator: each page loaded on first visit.
      { path: 'projects/:projectId/scenarios/new', lazy: () => import('@/features/scenarios/components/scenario-editor-page').then((m) => ({ Component: m.ScenarioEditorPage })) },
      { path: 'projects/:projectId/scenarios/:scenarioId', lazy: () => import('@/features/scenarios/components/scenario-editor-page').then((m) => ({ Component: m.ScenarioEditorPage })) },
      { path: 'projects/:projectId/runs/:runId', lazy: () => import('@/features/runs/components/run-page').then((m) => ({ Component: m.RunPage })) },
      { path: 'projects/:projectId/compare', lazy: () => import('@/features/compare/components/compare-page').then((m) => ({ Component: m.ComparePage })) },
      { path: 'projects/:projectId/envelopes', lazy: () => import('@/features/envelopes/components/envelopes-page').then((m) => ({ Component: m.EnvelopesPage })) },
      { path: 'calculator', lazy: () => import('@/features/calculator/components/calculator-page').then((m) => ({ Component: m.CalculatorPage })) },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
