/**
 * The API's answers, one entry per route: its success status and the zod schema of its JSON body (or the file types
 * it sends, or nothing). The server's tests check real answers against these schemas, the client derives its types
 * from them, and server/openapi.ts turns them into the OpenAPI document at GET /api/openapi.json.
 */
import type { z } from 'zod';
import {
  climateFileCreatedResponse,
  climateFileDetailResponse,
  climateFileHoursResponse,
  climateFileListResponse,
  climatePreviewResponse,
} from './climate-files';
import { envelopeListResponse, envelopePresetsResponse, envelopeResponse } from './envelopes';
import { apiErrorBodySchema, healthResponse } from './health';
import {
  adminChangedResponse,
  auditResponse,
  inviteAcceptedResponse,
  inviteListResponse,
  invitePreviewResponse,
  inviteSentResponse,
  mailboxResponse,
  memberRoleResponse,
  meResponse,
  peopleResponse,
  projectMembersResponse,
  sessionResponse,
  signedOutEverywhereResponse,
} from './people';
import { projectCreatedResponse, projectListResponse, projectStorageResponse, projectUpdatedResponse } from './projects';
import {
  comparisonReportResponse,
  runReportResponse,
  shareLinkCreatedResponse,
  shareLinkListResponse,
  shareLinkResponse,
  sharedReportResponse,
} from './reports';
import { runHoursResponse, runListResponse, runResponse, runsCreatedResponse } from './runs';
import { scenarioListResponse, scenarioPreviewResponse, scenarioResponse } from './scenarios';
import { siteListResponse, siteResponse } from './sites';
import { projectionCreatedResponse, projectionPreviewResponse, projectionResponse, excursionsResponse } from './studies';
import { sweepCancelledResponse, sweepListResponse, sweepResponse } from './sweeps';

export * from './common';
export * from './climate-files';
export * from './envelopes';
export * from './health';
export * from './people';
export * from './projects';
export * from './reports';
export * from './runs';
export * from './scenarios';
export * from './sites';
export * from './studies';
export * from './sweeps';

/** A route's success answer: a JSON body with its schema, a file of these media types, a redirect, or nothing (204). */
export type ApiAnswer = { status: number; summary: string } & ({ json: z.ZodType } | { file: readonly string[] } | { redirect: true } | { empty: true });

const json = <S extends z.ZodType>(status: number, summary: string, schema: S) => ({ status, summary, json: schema });
const file = (summary: string, ...types: string[]) => ({ status: 200, summary, file: types });
const none = (summary: string) => ({ status: 204, summary, empty: true as const });
const redirect = (summary: string) => ({ status: 302, summary, redirect: true as const });

/** Every route's answer, keyed by `method path` as the server registers it (Express syntax, under /api). */
export const apiAnswers = {
  'get /health': json(200, 'Whether the server and its database answer, and the versions running', healthResponse),
  'get /openapi.json': file('This document', 'application/json'),

  'get /projects': json(200, "The caller's projects with their role in each", projectListResponse),
  'post /projects': json(201, 'Create a project; the caller becomes its owner', projectCreatedResponse),
  'get /projects/:projectId/storage': json(200, 'What the project stores against its limit', projectStorageResponse),
  'patch /projects/:projectId': json(200, "Change a project's name or description", projectUpdatedResponse),
  'delete /projects/:projectId': none('Delete a project and everything in it'),

  'get /projects/:projectId/sites': json(200, "The project's sites", siteListResponse),
  'post /projects/:projectId/sites': json(201, 'Add a site', siteResponse),
  'patch /projects/:projectId/sites/:siteId': json(200, 'Change a site', siteResponse),
  'delete /projects/:projectId/sites/:siteId': none('Delete a site and its climate files'),

  'get /projects/:projectId/climate-files': json(200, "The project's climate files", climateFileListResponse),
  'post /projects/:projectId/sites/:siteId/climate-files/preview': json(200, 'Import an upload without storing it', climatePreviewResponse),
  'post /projects/:projectId/sites/:siteId/climate-files': json(
    201,
    'Import and store an upload (422 import_rejected with the report otherwise)',
    climateFileCreatedResponse,
  ),
  'get /projects/:projectId/climate-files/:fileId': json(200, 'A climate file with its mapping, report and summary', climateFileDetailResponse),
  'get /projects/:projectId/climate-files/:fileId/hours': json(200, "A climate file's stored hours", climateFileHoursResponse),
  'get /projects/:projectId/climate-files/:fileId/original': file('The file as uploaded', 'application/octet-stream'),
  'get /projects/:projectId/climate-files/:fileId/hourly.csv': file('The stored hours as CSV', 'text/csv'),
  'get /projects/:projectId/climate-issue-lists/:listId': file("An upload's full issue list as CSV", 'text/csv'),
  'delete /projects/:projectId/climate-files/:fileId': none('Delete a climate file'),

  'get /envelope-presets': json(200, 'The published inlet envelopes', envelopePresetsResponse),
  'get /projects/:projectId/envelopes': json(200, "The project's own envelopes", envelopeListResponse),
  'post /projects/:projectId/envelopes': json(201, 'Add an envelope', envelopeResponse),
  'delete /projects/:projectId/envelopes/:envelopeId': none('Delete an envelope'),

  'get /projects/:projectId/scenarios': json(200, "The project's scenarios, newest change first", scenarioListResponse),
  'post /projects/:projectId/scenarios': json(201, 'Save a new scenario', scenarioResponse),
  'get /projects/:projectId/scenarios/:scenarioId': json(200, 'A scenario', scenarioResponse),
  'put /projects/:projectId/scenarios/:scenarioId': json(200, 'Replace a scenario', scenarioResponse),
  'post /projects/:projectId/scenarios/:scenarioId/migration-notice/dismiss': json(200, "Dismiss the start-up migration's notice", scenarioResponse),
  'post /projects/:projectId/scenarios/:scenarioId/duplicate': json(201, 'Copy a scenario', scenarioResponse),
  'delete /projects/:projectId/scenarios/:scenarioId': none('Delete a scenario (its runs stay)'),
  'post /projects/:projectId/scenarios/preview': json(200, 'Hours per mode of an unsaved scenario', scenarioPreviewResponse),

  'get /projects/:projectId/runs': json(200, "The project's runs with their totals, newest first", runListResponse),
  'post /projects/:projectId/runs': json(202, 'Queue every scenario on every climate file', runsCreatedResponse),
  'get /projects/:projectId/runs/:runId': json(200, 'A run with its inputs as run and its results', runResponse),
  'get /projects/:projectId/runs/:runId/hours': json(200, "A finished run's mode of each hour", runHoursResponse),
  'get /projects/:projectId/runs/:runId/hour-columns': file(
    "A finished run's hourly columns, binary (shared/report/hour-columns.ts)",
    'application/octet-stream',
  ),
  'post /projects/:projectId/runs/:runId/cancel': json(200, 'Cancel a queued or running run', runResponse),
  'delete /projects/:projectId/runs/:runId': none('Delete a run'),

  'get /projects/:projectId/sweeps': json(200, "The project's sweeps with their progress", sweepListResponse),
  'post /projects/:projectId/sweeps': json(202, 'Queue a sweep: one run per point', sweepResponse),
  'get /projects/:projectId/sweeps/:sweepId': json(200, "A sweep with its points' results", sweepResponse),
  'post /projects/:projectId/sweeps/:sweepId/cancel': json(200, "Stop a sweep's waiting and running points", sweepCancelledResponse),
  'delete /projects/:projectId/sweeps/:sweepId': none('Delete a sweep and its runs'),

  'post /projects/:projectId/climate-files/:fileId/projections/preview': json(
    200,
    "A projection's monthly statistics, nothing stored",
    projectionPreviewResponse,
  ),
  'post /projects/:projectId/climate-files/:fileId/projections': json(201, 'Store a future-climate projection', projectionCreatedResponse),
  'get /projects/:projectId/projections/:fileId': json(200, 'A projection with its parent and how it was made', projectionResponse),
  'get /projects/:projectId/runs/:runId/excursions': json(200, 'A proposed setpoint or envelope checked against a run', excursionsResponse),

  'get /projects/:projectId/runs/:runId/report': json(200, "A run's report data", runReportResponse),
  'get /projects/:projectId/compare/report': json(200, "A comparison's report data", comparisonReportResponse),
  'get /projects/:projectId/runs/:runId/downloads/:file': file(
    "A run's summary or hourly results (summary.csv, summary.json, hourly.csv, hourly.json)",
    'text/csv',
    'application/json',
  ),
  'get /projects/:projectId/compare/downloads/:file': file("A comparison's summary or hourly results", 'text/csv', 'application/json'),
  'get /projects/:projectId/share-links': json(200, "The project's share links", shareLinkListResponse),
  'post /projects/:projectId/share-links': json(201, 'Make a share link; its token is shown once', shareLinkCreatedResponse),
  'post /projects/:projectId/share-links/:linkId/revoke': json(200, 'Revoke a share link', shareLinkResponse),
  'get /shared/:token': json(200, 'The report a share link shows', sharedReportResponse),
  'get /shared/:token/downloads/:file': file("A shared report's downloads", 'text/csv', 'application/json'),

  'get /auth/sign-in': redirect('Start signing in at the provider'),
  'get /auth/callback': redirect("The provider's answer; back to the page signing in started from"),
  'get /auth/session': json(200, 'Who is signed in here', sessionResponse),
  'post /auth/sign-out': none('End this session'),
  'post /auth/sign-out-everywhere': json(200, "End every one of the caller's sessions", signedOutEverywhereResponse),
  'get /me': json(200, "The caller's account, settings and projects", meResponse),
  'patch /me': json(200, "Change the caller's settings", meResponse),
  'get /projects/:projectId/members': json(200, "The project's members", projectMembersResponse),
  'patch /projects/:projectId/members/:userId': json(200, "Change a member's role", memberRoleResponse),
  'delete /projects/:projectId/members/:userId': none('Remove a member'),
  'get /admin/people': json(200, 'Everyone who has signed in (admins)', peopleResponse),
  'patch /admin/people/:userId': json(200, 'Grant or revoke admin', adminChangedResponse),
  'get /projects/:projectId/invites': json(200, "The project's invitations", inviteListResponse),
  'post /projects/:projectId/invites': json(201, 'Invite someone by e-mail', inviteSentResponse),
  'delete /projects/:projectId/invites/:inviteId': none('Revoke an invitation'),
  'post /invites/preview': json(200, 'What an invitation link offers', invitePreviewResponse),
  'post /invites/accept': json(200, 'Accept an invitation', inviteAcceptedResponse),
  'get /audit': json(200, "The installation's audit trail (admins)", auditResponse),
  'get /projects/:projectId/audit': json(200, "The project's audit trail (owners)", auditResponse),
  'get /mailbox': json(200, "The local mail catcher's messages (admins, default set-up)", mailboxResponse),
} as const satisfies Record<string, ApiAnswer>;

export type ApiRouteKey = keyof typeof apiAnswers;

/** The body of every refusal (4xx and 5xx). */
export const apiErrorSchema = apiErrorBodySchema;
