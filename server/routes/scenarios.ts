import { z } from 'zod';
import { MODE_NAMES } from '../../shared/scenario';
import { standardOffsetMinutes } from '../../shared/climate';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { climateFileOr404, loadClimateSeries } from '../climate/store';
import { closedRequestSignal } from '../request-signal';
import {
  createScenario,
  deleteScenario,
  dismissMigrationNotice,
  duplicateScenario,
  listScenarios,
  presentScenario,
  scenarioOr404,
  updateScenario,
  validScenario,
} from '../scenarios/store';
import { siteById } from '../sites/store';

const scenarioParams = z.object({ scenarioId: z.coerce.number().int().positive('scenarioId must be a positive whole number') });
const previewInput = z.object({ scenario: z.unknown(), climateFileId: z.number().int().positive() });

export function scenarioRoutes(deps: AppDeps): RouteSpec[] {
  const { db, pool } = deps;
  const scenarioOf = (projectId: number, params: unknown) => scenarioOr404(db, projectId, scenarioParams.parse(params).scenarioId);

  return [
    route('get', '/projects/:projectId/scenarios', access.viewer, (req, res) => {
      res.json({ scenarios: listScenarios(db, req.projectId!).map(presentScenario) });
    }),
    route('post', '/projects/:projectId/scenarios', access.engineer, (req, res) => {
      const scenario = validScenario(req.body?.scenario);
      res.status(201).json({ scenario: presentScenario(createScenario(db, req.projectId!, scenario, req)) });
    }),
    route('get', '/projects/:projectId/scenarios/:scenarioId', access.viewer, (req, res) => {
      res.json({ scenario: presentScenario(scenarioOf(req.projectId!, req.params)) });
    }),
    route('put', '/projects/:projectId/scenarios/:scenarioId', access.engineer, (req, res) => {
      const existing = scenarioOf(req.projectId!, req.params);
      const scenario = validScenario(req.body?.scenario);
      res.json({ scenario: presentScenario(updateScenario(db, existing, scenario, req)) });
    }),
    route('post', '/projects/:projectId/scenarios/:scenarioId/migration-notice/dismiss', access.engineer, (req, res) => {
      const existing = scenarioOf(req.projectId!, req.params);
      res.json({ scenario: presentScenario(dismissMigrationNotice(db, existing, req)) });
    }),
    route('post', '/projects/:projectId/scenarios/:scenarioId/duplicate', access.engineer, (req, res) => {
      const existing = scenarioOf(req.projectId!, req.params);
      res.status(201).json({ scenario: presentScenario(duplicateScenario(db, existing, req)) });
    }),
    route('delete', '/projects/:projectId/scenarios/:scenarioId', access.engineer, (req, res) => {
      deleteScenario(db, scenarioOf(req.projectId!, req.params), req);
      res.status(204).end();
    }),
    // Hours per mode while the scenario is being edited: computed on the pool, never stored.
    route('post', '/projects/:projectId/scenarios/preview', access.engineer, async (req, res) => {
      const input = previewInput.parse(req.body);
      const scenario = validScenario(input.scenario);
      const file = climateFileOr404(db, req.projectId!, input.climateFileId);
      const site = siteById(db, file.siteId);
      const series = loadClimateSeries(db, file.id)!;
      const out = await pool.run(
        'executeRun',
        {
          scenario,
          series,
          options: { elevationM: site.elevationM, utcOffsetMinutes: standardOffsetMinutes(site.timeZone) },
        },
        { lane: 'interactive', signal: closedRequestSignal(res) },
      );
      const loops = out.results.loops;
      res.json({
        hours: out.results.hours,
        modes: MODE_NAMES,
        energy: out.results.energy,
        water: out.results.water,
        // A hybrid hall's preview shows each loop's hours beside the hall's.
        ...(loops ? { loops: { liquid: { hours: loops.liquid.hours }, air: { hours: loops.air.hours } } } : {}),
      });
    }),
  ];
}
