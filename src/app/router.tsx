import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppShell } from './app-shell';
import { HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';
import { RouteError } from './routes/route-error';
import { SignInRoute } from './routes/sign-in';
import { SignedInRoute } from './routes/signed-in';

const router = createBrowserRouter([
  {
    element: <AppShell />,
    errorElement: <RouteError />,
    // Shown while the first page's code loads, when that page is one of the lazily loaded ones.
    hydrateFallbackElement: <p className="p-6 text-sm text-ink-soft">Loading Tramontane…</p>,
    children: [
      { index: true, element: <HomeRoute /> },
      // Scenarios, runs, comparison, envelopes and the state calculator: each page loaded on first visit.
      {
        path: 'projects/:projectId/scenarios/new',
        lazy: () => import('./routes/scenario-editor').then((m) => ({ Component: m.ScenarioEditorRoute })),
      },
      {
        path: 'projects/:projectId/scenarios/:scenarioId',
        lazy: () => import('./routes/scenario-editor').then((m) => ({ Component: m.ScenarioEditorRoute })),
      },
      { path: 'projects/:projectId/runs/:runId', lazy: () => import('./routes/run').then((m) => ({ Component: m.RunRoute })) },
      { path: 'projects/:projectId/compare', lazy: () => import('./routes/compare').then((m) => ({ Component: m.CompareRoute })) },
      // Studies: sweeps, future-climate projections, excursions for operators, print-ready reports.
      {
        path: 'projects/:projectId/sweeps/new',
        lazy: () => import('./routes/new-sweep').then((m) => ({ Component: m.NewSweepRoute })),
      },
      { path: 'projects/:projectId/sweeps/:sweepId', lazy: () => import('./routes/sweep').then((m) => ({ Component: m.SweepRoute })) },
      {
        path: 'projects/:projectId/projections/new',
        lazy: () => import('./routes/new-projection').then((m) => ({ Component: m.NewProjectionRoute })),
      },
      {
        path: 'projects/:projectId/projections/:fileId',
        lazy: () => import('./routes/projection').then((m) => ({ Component: m.ProjectionRoute })),
      },
      {
        path: 'projects/:projectId/runs/:runId/excursions',
        lazy: () => import('./routes/excursions').then((m) => ({ Component: m.ExcursionsRoute })),
      },
      {
        path: 'projects/:projectId/runs/:runId/report',
        lazy: () => import('./routes/run-report').then((m) => ({ Component: m.RunReportRoute })),
      },
      {
        path: 'projects/:projectId/compare/report',
        lazy: () => import('./routes/comparison-report').then((m) => ({ Component: m.ComparisonReportRoute })),
      },
      { path: 'shared/:token', lazy: () => import('./routes/shared-report').then((m) => ({ Component: m.SharedReportRoute })) },
      {
        path: 'projects/:projectId/envelopes',
        lazy: () => import('./routes/envelopes').then((m) => ({ Component: m.EnvelopesRoute })),
      },
      { path: 'calculator', lazy: () => import('./routes/calculator').then((m) => ({ Component: m.CalculatorRoute })) },
      // Project overview, sites and climate files.
      { path: 'projects/:projectId', lazy: () => import('./routes/project-overview').then((m) => ({ Component: m.ProjectOverviewRoute })) },
      {
        path: 'projects/:projectId/climate-files/new',
        lazy: () => import('./routes/climate-file-upload').then((m) => ({ Component: m.ClimateFileUploadRoute })),
      },
      { path: 'projects/:projectId/climate-files/:fileId', lazy: () => import('./routes/climate-file').then((m) => ({ Component: m.ClimateFileRoute })) },
      { path: 'projects/:projectId/sites/:siteId', lazy: () => import('./routes/site').then((m) => ({ Component: m.SiteRoute })) },
      // Sign-in, settings, members, invitations, audit trail and the local mailbox.
      { path: 'sign-in', element: <SignInRoute /> },
      // Open signed out too: the page names the project and the inviter, then offers sign-in.
      { path: 'invites/accept', lazy: () => import('./routes/accept-invite').then((m) => ({ Component: m.AcceptInviteRoute })) },
      {
        element: <SignedInRoute />,
        children: [
          { path: 'settings', lazy: () => import('./routes/settings').then((m) => ({ Component: m.SettingsRoute })) },
          { path: 'projects/:projectId/members', lazy: () => import('./routes/members').then((m) => ({ Component: m.MembersRoute })) },
          { path: 'projects/:projectId/audit', lazy: () => import('./routes/audit').then((m) => ({ Component: m.AuditRoute })) },
          { path: 'audit', lazy: () => import('./routes/audit').then((m) => ({ Component: m.AuditRoute })) },
          { path: 'admin/people', lazy: () => import('./routes/people').then((m) => ({ Component: m.PeopleRoute })) },
          { path: 'mailbox', lazy: () => import('./routes/mailbox').then((m) => ({ Component: m.MailboxRoute })) },
        ],
      },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
