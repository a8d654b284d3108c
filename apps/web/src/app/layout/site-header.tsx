import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useClub } from '@/features/club/api/get-club';
import { MainNav } from './main-nav';

/** The ink-blue bar: wordmark, the club's name, the main navigation. */
export function SiteHeader() {
  const club = useClub();
  return (
    <header className="bg-ink-900 text-sand-100 [--focus-color:var(--color-signal-400)]">
      <div className="mx-auto flex max-w-6xl items-center justify-between gap-4 px-4 py-3">
        <Link
          to={paths.home.href()}
          className="flex min-h-11 flex-col justify-center text-sand-100 no-underline hover:text-white"
        >
          <span className="text-xl leading-tight font-bold tracking-tight">
            Rode<span className="text-signal-400">wise</span>
          </span>
          {club.data && (
            <span className="text-xs leading-tight text-sand-300">{club.data.name}</span>
          )}
        </Link>
        <MainNav />
      </div>
    </header>
  );
}
