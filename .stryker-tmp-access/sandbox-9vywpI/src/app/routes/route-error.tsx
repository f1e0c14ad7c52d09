// @ts-nocheck
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';

/** The error boundary for every route: says what broke and offers a way on, never a blank page. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'An unexpected error occurred.';
  return (
    <div role="alert" className="mx-auto max-w-lg py-16">
      <h1 className="text-lg font-semibold text-signal-bad">Something went wrong on this page</h1>
      <p className="num mt-2 rounded border border-rule bg-panel p-3 text-sm">{message}</p>
      <p className="mt-3 text-sm text-ink-soft">Reload the page; if it happens again, note what you did and tell the team.</p>
      <button type="button" onClick={() => window.location.reload()} className="mt-4 rounded bg-harbour px-4 py-2 text-sm text-paper hover:bg-harbour-soft">
        Reload
      </button>
    </div>
  );
}
