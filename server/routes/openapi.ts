import packageJson from '../../package.json' with { type: 'json' };
import { access, route, type RouteSpec } from '../auth/access';
import { openApiDocument } from '../openapi';

/** GET /api/openapi.json: the document of `routes()` (every API route, this one included), built at the first request. */
export function openApiRoutes(routes: () => readonly RouteSpec[]): RouteSpec[] {
  let text: string | undefined;
  return [
    route('get', '/openapi.json', access.public, (_req, res) => {
      text ??= JSON.stringify(openApiDocument(routes(), packageJson.version));
      res.type('application/json').send(text);
    }),
  ];
}
