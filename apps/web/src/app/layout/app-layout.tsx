import { Suspense } from 'react';
import { Outlet } from 'react-router-dom';
import { PageFallback } from './page-fallback';
import { ScreenBoundary } from './screen-boundary';
import { SiteFooter } from './site-footer';
import { SiteHeader } from './site-header';
import { SkipLink } from './skip-link';

/**
 * Header, main content, footer; every screen renders inside the `<Outlet />`, under the boundaries for its
 * loading (Suspense) and its errors.
 */
export function AppLayout() {
  return (
    <div className="flex min-h-dvh flex-col">
      <SkipLink />
      <SiteHeader />
      <main
        id="main"
        tabIndex={-1}
        className="min-h-dvh flex-1 px-4 py-8 focus:outline-none sm:py-10"
      >
        <ScreenBoundary>
          <Suspense fallback={<PageFallback />}>
            <Outlet />
          </Suspense>
        </ScreenBoundary>
      </main>
      <SiteFooter />
    </div>
  );
}
