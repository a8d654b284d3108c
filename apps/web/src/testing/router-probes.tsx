import { useEffect } from 'react';
import { useLocation, useRoutes, type Location, type RouteObject } from 'react-router-dom';

/** Records where the memory router is, for tests that follow a redirect. */
export function LocationProbe({ intoRef }: { intoRef: { current?: Location } }) {
  const location = useLocation();
  useEffect(() => {
    intoRef.current = location;
  }, [intoRef, location]);
  return null;
}

/** The given routes, as the only screens. */
export function Screens({ routes }: { routes: RouteObject[] }) {
  return useRoutes(routes);
}
