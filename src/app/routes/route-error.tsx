import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { ApiError, DATABASE_UNREACHABLE, isDatabaseUnavailable } from '../../lib/api-client';

export function RouteError() {
  const error = useRouteError();
  const notFound = (isRouteErrorResponse(error) && error.status === 404) || (error instanceof ApiError && error.status === 404);
  const message = isRouteErrorResponse(error) ? error.statusText : error instanceof Error ? error.message : 'Unknown error';
  return (
    <div className="mx-auto mt-16 max-w-lg rounded border border-line bg-panel p-8">
      <h1 className="text-2xl font-semibold">
        {notFound ? 'Not found' : isDatabaseUnavailable(error) ? DATABASE_UNREACHABLE : 'Something went wrong'}
      </h1>
      <p className="mt-2 text-sm text-ink-soft">
        {notFound ? 'That page or record does not exist, or belongs to another organisation.' : message}
      </p>
      <Link to="/jobs" className="mt-4 inline-block text-sm font-semibold text-copper-700 underline">
        Back to Jobs
      </Link>
    </div>
  );
}
