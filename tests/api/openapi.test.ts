import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { apiRoutes } from '../../server/app';
import { apiAnswers, healthResponse } from '../../shared/schemas/api';
import { expectShape } from '../support/expect-shape';
import { createTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(() => {
  t = createTestApp({}, { threads: 1, interactiveThreads: 1 });
});
afterAll(() => t.close());

const methods = ['get', 'put', 'post', 'delete', 'options', 'head', 'patch', 'trace'] as const;

/**
 * The skeleton of an OpenAPI 3.1 document as the specification (spec.openapis.org/oas/v3.1.0) requires it: the
 * version string, info with title and version, paths whose keys start with "/", operations with at least one
 * response, and path parameters named in the path and marked required.
 */
const openApi31 = z.object({
  openapi: z.string().regex(/^3\.1\.\d+$/),
  info: z.object({ title: z.string().min(1), version: z.string().min(1) }),
  paths: z.record(
    z.string().regex(/^\//),
    z.partialRecord(
      z.enum(methods),
      z.object({
        responses: z.record(z.string().regex(/^([1-5]\d\d|default)$/), z.object({ description: z.string() })).refine((r) => Object.keys(r).length > 0),
        parameters: z.array(z.object({ name: z.string(), in: z.literal('path'), required: z.literal(true) })).optional(),
      }),
    ),
  ),
  components: z.object({ schemas: z.record(z.string(), z.unknown()) }).optional(),
});

describe('the OpenAPI document at GET /api/openapi.json', () => {
  it('is public, parses as OpenAPI 3.1 and names every route the app registers with its method', async () => {
    const res = await request(t.app).get('/api/openapi.json').expect(200);
    expect(res.type).toBe('application/json');
    const doc = expectShape(openApi31, res.body);
    const registered = apiRoutes(t).map((r) => `${r.method} ${r.path.replace(/:(\w+)/g, '{$1}')}`);
    const documented = Object.entries(doc.paths).flatMap(([path, ops]) => Object.keys(ops).map((method) => `${method} ${path}`));
    expect(documented.sort()).toEqual(registered.sort());
    // Every path parameter is declared, and none that is not in the path.
    for (const [path, ops] of Object.entries(doc.paths)) {
      const inPath = [...path.matchAll(/\{(\w+)\}/g)].map(([, name]) => name);
      for (const op of Object.values(ops)) expect((op?.parameters ?? []).map((p) => p.name)).toEqual(inPath);
    }
    // Every $ref points into the document.
    for (const [, ref] of JSON.stringify(doc).matchAll(/"\$ref":"#\/components\/schemas\/(\w+)"/g)) expect(doc.components?.schemas).toHaveProperty(ref);
  });

  it("carries each route's response schema as zod writes it, and that schema accepts the real answer", async () => {
    const doc = (await request(t.app).get('/api/openapi.json').expect(200)).body;
    const documented = doc.paths['/health'].get.responses['200'].content['application/json'].schema;
    const { $schema: _draft, ...fromZod } = z.toJSONSchema(healthResponse, { target: 'draft-2020-12', io: 'output', unrepresentable: 'any' });
    expect(documented).toEqual(fromZod);
    // Read back from the document alone (z.fromJSONSchema), the schema takes a real answer and refuses a broken one.
    const readBack = z.fromJSONSchema(documented);
    const health = (await request(t.app).get('/api/health').expect(200)).body;
    expect(readBack.safeParse(health).success).toBe(true);
    expect(readBack.safeParse({ ...health, database: { reachable: 'yes' } }).success).toBe(false);
    // The runs list's schema (a larger one) is the same in the document as in shared/schemas/api.
    const runs = doc.paths['/projects/{projectId}/runs'].get.responses['200'].content['application/json'].schema;
    expect(runs).toEqual(
      JSON.parse(JSON.stringify(z.toJSONSchema(apiAnswers['get /projects/:projectId/runs'].json, { unrepresentable: 'any' })), (k, v) =>
        k === '$schema' ? undefined : v,
      ),
    );
    expect(doc.paths['/projects/{projectId}/runs'].get['x-tramontane-access']).toBe('project viewer or higher');
  });
});
