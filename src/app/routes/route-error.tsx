import { isRouteErrorResponse, Link, useRouteError } from 'react-router';

/** Shown when a screen fails to load or throws while rendering; the rest of the app keeps working. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <div className="mx-auto max-w-xl px-4 py-16">
      <h1 className="font-serif text-2xl font-bold text-pine-900">This page ran into a problem</h1>
      <p className="mt-2 text-stone-700">
        Nothing you saved has been lost. Reload the page, or go back to your start page.
      </p>
      <p className="mt-4 rounded bg-stone-100 p-3 font-mono text-sm text-stone-700">{message}</p>
      <Link to="/" className="mt-6 inline-block font-semibold text-pine-700 underline">
        Back to the start page
      </Link>
    </div>
  );
}
