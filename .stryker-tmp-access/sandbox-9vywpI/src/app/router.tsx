// @ts-nocheck
import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppShell } from './app-shell';
import { HomeRoute } from './routes/home';
import { NotFoundRoute } from './routes/not-found';
import { RouteError } from './routes/route-error';
import { SignInPage } from '@/features/auth/components/sign-in-page';
import { RequireSignIn } from '@/features/auth/components/require-sign-in';

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
        lazy: () => import('@/features/scenarios/components/scenario-editor-page').then((m) => ({ Component: m.ScenarioEditorPage })),
      },
      {
        path: 'projects/:projectId/scenarios/:scenarioId',
        lazy: () => import('@/features/scenarios/components/scenario-editor-page').then((m) => ({ Component: m.ScenarioEditorPage })),
      },
      { path: 'projects/:projectId/runs/:runId', lazy: () => import('@/features/runs/components/run-page').then((m) => ({ Component: m.RunPage })) },
      { path: 'projects/:projectId/compare', lazy: () => import('@/features/compare/components/compare-page').then((m) => ({ Component: m.ComparePage })) },
      // Studies: sweeps, future-climate projections, excursions for operators, print-ready reports.
      {
        path: 'projects/:projectId/sweeps/new',
        lazy: () => import('@/features/sweeps/components/new-sweep-page').then((m) => ({ Component: m.NewSweepPage })),
      },
      { path: 'projects/:projectId/sweeps/:sweepId', lazy: () => import('@/features/sweeps/components/sweep-page').then((m) => ({ Component: m.SweepPage })) },
      {
        path: 'projects/:projectId/projections/new',
        lazy: () => import('@/features/projections/components/new-projection-page').then((m) => ({ Component: m.NewProjectionPage })),
      },
      {
        path: 'projects/:projectId/projections/:fileId',
        lazy: () => import('@/features/projections/components/projection-page').then((m) => ({ Component: m.ProjectionPage })),
      },
      {
        path: 'projects/:projectId/runs/:runId/excursions',
        lazy: () => import('@/features/excursions/components/excursions-page').then((m) => ({ Component: m.ExcursionsPage })),
      },
      {
        path: 'projects/:projectId/runs/:runId/report',
        lazy: () => import('@/features/reports/components/run-report-page').then((m) => ({ Component: m.RunReportPage })),
      },
      {
        path: 'projects/:projectId/compare/report',
        lazy: () => import('@/features/reports/components/comparison-report-page').then((m) => ({ Component: m.ComparisonReportPage })),
      },
      { path: 'shared/:token', lazy: () => import('@/features/reports/components/shared-report-page').then((m) => ({ Component: m.SharedReportPage })) },
      {
        path: 'projects/:projectId/envelopes',
        lazy: () => import('@/features/envelopes/components/envelopes-page').then((m) => ({ Component: m.EnvelopesPage })),
      },
      { path: 'calculator', lazy: () => import('@/features/calculator/components/calculator-page').then((m) => ({ Component: m.CalculatorPage })) },
      // Project overview, sites and climate files.
      { path: 'projects/:projectId', lazy: () => import('./routes/project-overview').then((m) => ({ Component: m.ProjectOverviewRoute })) },
      {
        path: 'projects/:projectId/climate-files/new',
        lazy: () => import('./routes/climate-file-upload').then((m) => ({ Component: m.ClimateFileUploadRoute })),
      },
      { path: 'projects/:projectId/climate-files/:fileId', lazy: () => import('./routes/climate-file').then((m) => ({ Component: m.ClimateFileRoute })) },
      { path: 'projects/:projectId/sites/:siteId', lazy: () => import('./routes/site').then((m) => ({ Component: m.SiteRoute })) },
      // Sign-in, settings, members, invitations, audit trail and the local mailbox.
      { path: 'sign-in', element: <SignInPage /> },
      // Open signed out too: the page names the project and the inviter, then offers sign-in.
      { path: 'invites/accept', lazy: () => import('@/features/members/components/accept-invite-page').then((m) => ({ Component: m.AcceptInvitePage })) },
      {
        element: <RequireSignIn />,
        children: [
          { path: 'settings', lazy: () => import('@/features/auth/components/settings-page').then((m) => ({ Component: m.SettingsPage })) },
          { path: 'projects/:projectId/members', lazy: () => import('@/features/members/components/members-page').then((m) => ({ Component: m.MembersPage })) },
          { path: 'projects/:projectId/audit', lazy: () => import('@/features/audit/components/audit-page').then((m) => ({ Component: m.AuditPage })) },
          { path: 'audit', lazy: () => import('@/features/audit/components/audit-page').then((m) => ({ Component: m.AuditPage })) },
          { path: 'admin/people', lazy: () => import('@/features/members/components/people-page').then((m) => ({ Component: m.PeoplePage })) },
          { path: 'mailbox', lazy: () => import('@/features/auth/components/mailbox-page').then((m) => ({ Component: m.MailboxPage })) },
        ],
      },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
