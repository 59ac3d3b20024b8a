import { Link, useRouteError } from 'react-router-dom';
import { Button, EmptyState } from '../../components/ui';

/** A screen whose code could not be fetched: the connection dropped before this tablet kept it. */
const isFetchFailure = (error: unknown) =>
  error instanceof TypeError && /dynamically imported module|module script failed|Failed to fetch/i.test(error.message);

/** In place of a screen that failed to open: what happened in plain words, a way to try again and a way home. */
export function RouteError() {
  const error = useRouteError();
  const offline = !navigator.onLine || isFetchFailure(error);
  return (
    <div className="p-6">
      <EmptyState
        title="This screen could not open"
        action={
          <div className="flex flex-wrap justify-center gap-3">
            <Button onClick={() => window.location.reload()}>Try again</Button>
            <Link className="flex min-h-touch items-center text-cellar-700 underline" to="/">
              Go to the home screen
            </Link>
          </div>
        }
      >
        {offline
          ? 'There is no connection, and this tablet has not kept this screen yet. Entries you saved are kept on the tablet and are sent when the connection is back.'
          : 'Something went wrong while opening it. Your saved entries are safe.'}
      </EmptyState>
    </div>
  );
}
