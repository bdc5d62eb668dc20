import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { ApiError } from '@/lib/api-client';

/** What a route shows when its data cannot load: plain words and a way on. */
export function RouteError() {
  const error = useRouteError();
  let title = 'This page could not load.';
  let detail =
    'Try again in a moment. If it keeps happening, tell whoever runs Duskhaul for your operation.';
  if (error instanceof ApiError) {
    if (error.status === 404) {
      title = 'Not found.';
      detail = 'It may have been archived, or the link is wrong.';
    } else if (error.status === 403) {
      title = 'Your role does not open this page.';
      detail = error.message;
    } else if (error.status === 0) {
      title = 'No connection.';
      detail = error.message;
    } else {
      detail = error.message;
    }
  } else if (isRouteErrorResponse(error) && error.status === 404) {
    title = 'There is no page here.';
    detail = 'Check the address, or go back to the start.';
  }
  return (
    <div role="alert" className="mx-auto max-w-xl rounded-lg bg-dusk-850 p-6 ring-1 ring-dusk-700">
      <h1 className="text-xl font-semibold text-dusk-50">{title}</h1>
      <p className="mt-2 text-dusk-200">{detail}</p>
      <div className="mt-4 flex gap-4">
        <button
          type="button"
          className="text-ember-300 underline"
          onClick={() => window.location.reload()}
        >
          Try again
        </button>
        <Link to="/">Go to the start</Link>
      </div>
    </div>
  );
}
