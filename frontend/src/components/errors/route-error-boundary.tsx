import { isRouteErrorResponse, Navigate, useLocation, useRouteError } from 'react-router';

import { isApiError } from '../../lib/api-error';
import { signInPath } from '../../lib/sign-in-path';
import { Button } from '../ui/button';
import { FormError } from '../ui/form-error';
import { TextLink } from '../ui/text-link';
import { ForbiddenDataSchema } from './forbidden-data';
import { NotForYourRole } from './not-for-your-role';

function describe(error: unknown): string {
  if (isApiError(error)) return error.message;
  if (isRouteErrorResponse(error)) return error.status === 404 ? 'There is no page at this address.' : `${error.status} ${error.statusText}`;
  return 'This page ran into a problem we did not expect.';
}

/** Each route's error element: explains the failure where the page would be, and offers a way on. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const location = useLocation();

  // A session that ran out mid-load goes back to sign-in, and returns here afterwards.
  if (isApiError(error, 401)) return <Navigate to={signInPath(location)} replace />;

  if (isRouteErrorResponse(error) && error.status === 403) {
    const forbidden = ForbiddenDataSchema.safeParse(error.data);
    if (forbidden.success) return <NotForYourRole allowed={forbidden.data.allowed} current={forbidden.data.current} />;
  }

  // The console keeps the stack for whoever debugs it; the page keeps to plain words.
  console.error(error);
  const isMissing = isRouteErrorResponse(error) && error.status === 404;
  return (
    <section aria-labelledby="route-error-title" className="max-w-prose space-y-4 p-2">
      <h1 id="route-error-title" className="text-3xl font-bold">
        {isMissing ? 'Page not found' : 'This page could not be shown'}
      </h1>
      <FormError message={describe(error)} />
      <div className="flex flex-wrap items-center gap-4">
        {isMissing ? null : <Button onClick={() => window.location.reload()}>Try again</Button>}
        <TextLink to="/">Go to the home page</TextLink>
      </div>
    </section>
  );
}
