// @ts-nocheck
import { Link } from 'react-router-dom';

export function NotFoundRoute() {
  return (
    <div className="mx-auto max-w-lg py-16 text-center">
      <p className="num text-5xl font-semibold text-harbour">404</p>
      <h1 className="mt-3 text-lg font-semibold">This page does not exist</h1>
      <p className="mt-2 text-sm text-ink-soft">The link may be old, or the item was deleted.</p>
      <Link to="/" className="mt-6 inline-block rounded bg-harbour px-4 py-2 text-sm text-paper hover:bg-harbour-soft">
        Back to projects
      </Link>
    </div>
  );
}
