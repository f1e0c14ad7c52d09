import { expect } from 'vitest';
import type { z } from 'zod';
import { apiAnswers, type ApiRouteKey } from '../../shared/schemas/api';

/**
 * Checks an API answer against its zod schema in shared/schemas/api and returns it typed; a field missing, of the
 * wrong type or (in a closed object) not in the schema fails the test with zod's list of what differs.
 */
export function expectShape<S extends z.ZodType>(schema: S, body: unknown): z.output<S> {
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    expect.fail(`The answer does not match its schema:\n${parsed.error.issues.map((i) => `  ${i.path.join('.') || '(root)'}: ${i.message}`).join('\n')}`);
  }
  return parsed.data;
}

/** The same, by the route's key in shared/schemas/api (`'get /projects/:projectId/runs'`), with its success status checked too. */
export function expectAnswer(key: ApiRouteKey, res: { status: number; body: unknown }) {
  const answer = apiAnswers[key];
  expect(res.status, `status of ${key}`).toBe(answer.status);
  if ('json' in answer) return expectShape(answer.json, res.body);
  return res.body;
}
