import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { ErrorState } from '@/components/states';

/** Shown when a route module fails to load (e.g. after a deploy) or throws while rendering. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error) ? new Error(`${error.status} ${error.statusText}`) : error;
  return <ErrorState error={message} title="This page failed" onRetry={() => window.location.reload()} />;
}
