/** The one error a route throws; the error middleware turns it into the JSON shape. */
// @ts-nocheck

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

/** Every API error answers with this body. */
export interface ApiErrorBody {
  error: { code: string; message: string; details?: unknown };
}
