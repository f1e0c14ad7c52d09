import { z } from 'zod';
import { apiAnswers, apiErrorSchema, type ApiAnswer } from '../shared/schemas/api';
import type { AccessRule, RouteSpec } from './auth/access';

/** An OpenAPI 3.1 document: its schemas are JSON Schema 2020-12, which zod writes itself (z.toJSONSchema). */
export interface OpenApiDocument {
  openapi: string;
  info: { title: string; version: string; description: string };
  servers: { url: string }[];
  paths: Record<string, Record<string, unknown>>;
  components: { schemas: Record<string, unknown> };
}

/** `/projects/:projectId/runs/:runId` → `/projects/{projectId}/runs/{runId}`. */
export const openApiPath = (expressPath: string) => expressPath.replace(/:(\w+)/g, '{$1}');

/** The JSON Schema of a response schema, as the document carries it. Unrepresentable parts (a transform) read as any value. */
export const jsonSchemaOf = (schema: z.ZodType) => {
  const { $schema: _draft, ...rest } = z.toJSONSchema(schema, { target: 'draft-2020-12', io: 'output', unrepresentable: 'any' });
  return rest;
};

function accessText(rule: AccessRule): string {
  if (rule.level === 'project') return `project ${rule.role} or higher`;
  return rule.level;
}

function successResponse(answer: ApiAnswer) {
  if ('json' in answer) return { description: answer.summary, content: { 'application/json': { schema: jsonSchemaOf(answer.json) } } };
  if ('file' in answer) return { description: answer.summary, content: Object.fromEntries(answer.file.map((type) => [type, {}])) };
  if ('redirect' in answer) return { description: answer.summary, headers: { Location: { schema: { type: 'string' } } } };
  return { description: answer.summary };
}

/**
 * The OpenAPI document of the routes the app registers: each route's method and path, who may call it
 * (`x-tramontane-access`), its success answer from shared/schemas/api and the one error body for every refusal.
 * A route missing from `apiAnswers` throws here, so a new route cannot ship without its answer's schema.
 */
export function openApiDocument(routes: readonly RouteSpec[], version: string): OpenApiDocument {
  const paths: OpenApiDocument['paths'] = {};
  for (const route of routes) {
    const key = `${route.method} ${route.path}`;
    const answer = (apiAnswers as Record<string, ApiAnswer>)[key];
    if (!answer) throw new Error(`No answer schema for ${key} in shared/schemas/api/index.ts.`);
    const parameters = [...route.path.matchAll(/:(\w+)/g)].map(([, name]) => ({ name, in: 'path', required: true, schema: { type: 'string' } }));
    (paths[openApiPath(route.path)] ??= {})[route.method] = {
      summary: answer.summary,
      'x-tramontane-access': accessText(route.access),
      ...(parameters.length ? { parameters } : {}),
      responses: {
        [String(answer.status)]: successResponse(answer),
        default: {
          description: 'A refusal or failure, in the one error shape',
          content: { 'application/json': { schema: { $ref: '#/components/schemas/ApiError' } } },
        },
      },
    };
  }
  return {
    openapi: '3.1.0',
    info: {
      title: 'Tramontane API',
      version,
      description: 'Free-cooling, adiabatic and mechanical hours of data-centre cooling designs from hourly weather. Every path is under /api.',
    },
    servers: [{ url: '/api' }],
    paths,
    components: { schemas: { ApiError: jsonSchemaOf(apiErrorSchema) } },
  };
}
