import { Link, isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { Page } from '@/components/ui/page';
import { paths } from '@/config/paths';

export function NotFoundRoute() {
  return (
    <Page title="Page not found">
      <p className="text-sm text-muted">There is no page at this address.</p>
      <Link to={paths.home} className="mt-4 inline-block font-semibold text-accent underline">
        Go to your start page
      </Link>
    </Page>
  );
}

export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <Page title="This page failed to load">
      <p role="alert" className="rounded-md border border-act bg-act-soft p-3 text-sm text-act">
        {message}
      </p>
      <button type="button" className="mt-4 font-semibold text-accent underline" onClick={() => window.location.reload()}>
        Reload the page
      </button>
    </Page>
  );
}
