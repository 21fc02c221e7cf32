import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { ApiError, ConnectionError } from '../api/client';
import { buttonClass } from './button';

export function NotFoundView({ what = 'page' }: { what?: string }) {
  return (
    <section aria-labelledby="not-found-title" className="mx-auto max-w-xl py-16 text-center">
      <p className="num text-sm font-semibold text-muted">404</p>
      <h1 id="not-found-title" className="mt-1 text-2xl font-semibold">
        No such {what}
      </h1>
      <p className="mt-2 text-muted">
        It may have been removed, the address may be mistyped, or it belongs to a project you are
        not a member of.
      </p>
      <Link to="/" className={`${buttonClass('primary')} mt-6`}>
        Go to Projects
      </Link>
    </section>
  );
}

export function ConnectionLostView({ onRetry }: { onRetry?: () => void }) {
  return (
    <section aria-labelledby="offline-title" className="mx-auto max-w-xl py-16 text-center">
      <h1 id="offline-title" className="text-2xl font-semibold">
        Connection lost
      </h1>
      <p className="mt-2 text-muted">
        The Hoopline server cannot be reached. Nothing you have not saved has been sent; your inputs
        are still on this page if you go back.
      </p>
      <button
        type="button"
        className={`${buttonClass('primary')} mt-6`}
        onClick={onRetry ?? (() => window.location.reload())}
      >
        Try again
      </button>
    </section>
  );
}

export function ErrorView({ error }: { error: unknown }) {
  if (error instanceof ConnectionError) return <ConnectionLostView />;
  if (
    (error instanceof ApiError && error.status === 404) ||
    (isRouteErrorResponse(error) && error.status === 404)
  )
    return <NotFoundView />;
  const message =
    error instanceof ApiError
      ? error.message
      : error instanceof Error
        ? error.message
        : 'An unexpected error occurred.';
  return (
    <section aria-labelledby="error-title" className="mx-auto max-w-xl py-16 text-center">
      <h1 id="error-title" className="text-2xl font-semibold">
        Something went wrong
      </h1>
      <p className="mt-2 text-muted">{message}</p>
      <button
        type="button"
        className={`${buttonClass('primary')} mt-6`}
        onClick={() => window.location.reload()}
      >
        Reload the page
      </button>
    </section>
  );
}

/** The errorElement of every route: a page, never a blank screen. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  return (
    <main id="main" className="px-6">
      <ErrorView error={error} />
    </main>
  );
}
