/** The error element of every route: not found, sign in again, or what went wrong, in words. */
import { isRouteErrorResponse, Link, useLocation, useRouteError } from 'react-router-dom';
import { ApiError } from '../api/client.js';
import { NotFoundPage } from '../pages/not-found.js';

export function RouteError() {
  const error = useRouteError();
  const location = useLocation();
  if ((error instanceof ApiError && error.status === 404) || (isRouteErrorResponse(error) && error.status === 404))
    return <NotFoundPage />;
  if (error instanceof ApiError && error.status === 401) {
    return (
      <div role="alert" className="card max-w-lg">
        <h1>Please sign in again</h1>
        <p className="mt-2">Your session has ended.</p>
        <Link className="link mt-4 inline-block" to={`/sign-in?next=${encodeURIComponent(location.pathname)}`}>
          Sign in
        </Link>
      </div>
    );
  }
  const message = error instanceof Error ? error.message : 'Something went wrong.';
  return (
    <div role="alert" className="card max-w-lg">
      <h1>This page could not be shown</h1>
      <p className="mt-2">{message}</p>
      <p className="mt-4 flex gap-4">
        <button type="button" className="btn" onClick={() => window.location.reload()}>
          Try again
        </button>
        <Link className="link self-center" to="/">
          Home
        </Link>
      </p>
    </div>
  );
}
