import { useLayoutEffect } from 'react';
import { useLocation, useRoutes, type Location, type RouteObject } from 'react-router-dom';
import { ErrorCatcher } from '@/app/layout/screen-boundary';

/** Where the memory router is now, read after the test's actions (`current` is replaced on every move). */
export interface LocationRef {
  current: Location;
}

/** `routes` under the app's outer error boundary, reporting each location the router moves to. */
export function RoutesWithProbe({
  routes,
  locationRef,
}: {
  routes: RouteObject[];
  locationRef: LocationRef;
}) {
  const location = useLocation();
  useLayoutEffect(() => {
    locationRef.current = location;
  }, [location, locationRef]);
  return <ErrorCatcher>{useRoutes(routes)}</ErrorCatcher>;
}
