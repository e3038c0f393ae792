import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { NotFoundRoute } from '../routes/not-found.tsx';

/** Last resort for a page that crashed while rendering: say so plainly and offer a way back. */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundRoute />;
  const message = error instanceof Error ? error.message : 'Unknown error';
  return (
    <main className="mx-auto max-w-xl px-6 py-16">
      <h1 className="text-xl font-semibold">This page stopped working</h1>
      <p className="mt-2 text-ink-soft">Nothing you saved is lost. Reload the page, or go back to your workspace.</p>
      <pre className="figures mt-4 overflow-x-auto rounded border border-rule bg-paper-sunk p-3 text-xs text-ink-soft">{message}</pre>
      <p className="mt-6">
        <Link to="/" className="text-accent underline underline-offset-2">
          Back to Ridewright
        </Link>
      </p>
    </main>
  );
}
