import type express from 'express';
import type { RequestHandler } from 'express';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import { apiAnswers, apiErrorSchema, type ApiAnswer } from '../../shared/schemas/api';

/** The schema a JSON answer of this request must match: its route's success schema, or the one error body. */
function schemaFor(req: express.Request, status: number) {
  if (status >= 400) return { name: 'the error body', schema: apiErrorSchema };
  if (status < 200 || status >= 300 || !req.route) return undefined;
  const key = `${req.method.toLowerCase()} ${req.route.path as string}`;
  const answer = (apiAnswers as Record<string, ApiAnswer>)[key];
  if (!answer) throw new Error(`${key} answered ${status} but has no entry in shared/schemas/api/index.ts`);
  return 'json' in answer ? { name: key, schema: answer.json } : undefined;
}

function jsonText(body: unknown, encoding: string | undefined): string | undefined {
  if (typeof body === 'string') return body;
  if (!Buffer.isBuffer(body)) return undefined;
  if (encoding === 'gzip') return gunzipSync(body).toString('utf8');
  if (encoding === 'br') return brotliDecompressSync(body).toString('utf8');
  return body.toString('utf8');
}

/**
 * Every JSON answer under /api is checked against its schema in shared/schemas/api as it is sent: a success against
 * its route's answer, a refusal against the one error body. A mismatch throws, so the request fails with a 500 and
 * the error is logged (an unexpected console.error fails an API test): no API test can pass on an answer the
 * contract does not describe.
 */
export const checkJsonAnswers: RequestHandler = (req, res, next) => {
  if (!req.originalUrl.startsWith('/api/')) return next();
  const send = res.send.bind(res);
  let checking = false;
  res.send = (body?: unknown) => {
    const type = String(res.getHeader('Content-Type') ?? '');
    if (!checking && (type.startsWith('application/json') || (type === '' && typeof body === 'object' && !Buffer.isBuffer(body)))) {
      const target = schemaFor(req, res.statusCode);
      const text = jsonText(body, res.getHeader('Content-Encoding') as string | undefined);
      if (target && text !== undefined && text !== '') {
        const parsed = target.schema.safeParse(JSON.parse(text));
        if (!parsed.success) {
          const issues = parsed.error.issues.map((i) => `  ${i.path.join('.') || '(root)'}: ${i.message}`).join('\n');
          throw new Error(`${req.method} ${req.originalUrl} answered ${res.statusCode} with a body that does not match ${target.name}:\n${issues}`);
        }
      }
    }
    checking = true;
    try {
      return send(body as never);
    } finally {
      checking = false;
    }
  };
  next();
};
