import { Outlet } from 'react-router-dom';
import { SiteFooter } from './site-footer';
import { SiteHeader } from './site-header';
import { SkipLink } from './skip-link';

/** Header, main content, footer; every screen renders inside the `<Outlet />`. */
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
        <Outlet />
      </main>
      <SiteFooter />
    </div>
  );
}
