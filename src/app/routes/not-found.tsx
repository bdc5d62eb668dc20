import { Link } from 'react-router-dom';

/** Any URL the app does not have. */
export function NotFoundRoute() {
  return (
    <div className="mx-auto max-w-xl rounded-lg bg-dusk-850 p-6 ring-1 ring-dusk-700">
      <h1 className="text-xl font-semibold text-dusk-50">There is no page here.</h1>
      <p className="mt-2 text-dusk-200">Check the address, or go back to the start.</p>
      <Link className="mt-4 inline-block" to="/">
        Go to the start
      </Link>
    </div>
  );
}
