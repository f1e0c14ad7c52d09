import { apiErrorBodySchema } from '../../shared/schemas/api/health';

/** The one way the client talks to the server: JSON in, JSON out, errors in the server's one shape. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

async function send(path: string, init: RequestInit): Promise<Response> {
  const headers = new Headers(init.headers);
  // The server refuses signed-in changes without this header: a cross-site form or image cannot add it.
  headers.set('x-tramontane-request', '1');
  if (init.body && !(init.body instanceof FormData) && !headers.has('content-type')) {
    headers.set('content-type', 'application/json');
  }
  try {
    return await fetch(`/api${path}`, { ...init, headers, credentials: 'same-origin' });
  } catch {
    throw new ApiError(0, 'network', 'The server cannot be reached. Check that Tramontane is running.');
  }
}

/**
 * The one place the client reads the server's error body (shared/schemas/api/health.ts apiErrorBodySchema). A body
 * not in that shape (a proxy's page, say) still becomes an ApiError, named by its status.
 */
export function refusal(status: number, body: unknown): ApiError {
  const parsed = apiErrorBodySchema.safeParse(body);
  if (!parsed.success) return new ApiError(status, 'http_error', `The server answered ${status}.`);
  const { code, message, details } = parsed.data.error;
  return new ApiError(status, code, message, details);
}

export async function apiFetch<T>(path: string, init: RequestInit = {}): Promise<T> {
  const response = await send(path, init);
  const text = await response.text();
  const body = text ? safeJson(text) : undefined;
  if (!response.ok) throw refusal(response.status, body);
  return body as T;
}

/** A binary answer (application/octet-stream) as bytes; a refusal still arrives in the one JSON error shape. */
export async function apiFetchBytes(path: string, init: RequestInit = {}): Promise<ArrayBuffer> {
  const response = await send(path, init);
  if (!response.ok) {
    const text = await response.text();
    throw refusal(response.status, text ? safeJson(text) : undefined);
  }
  return response.arrayBuffer();
}

export function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}
