import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';

/** The error boundary of every route: says what happened and offers a way back. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <div role="alert" className="mx-auto max-w-xl p-8">
      <h1 className="text-xl font-semibold">This page hit a problem</h1>
      <p className="mt-2 text-ink-soft">Nothing you saved is lost. Reload the page, or go back to the start.</p>
      <pre className="mt-4 whitespace-pre-wrap rounded-plate bg-surface p-3 text-xs border border-line">{message}</pre>
      <Link to="/" className="mt-4 inline-block text-front underline">
        Back to the start
      </Link>
    </div>
  );
}
