import { Link } from 'react-router-dom';
import { Page } from '../../components/ui/page';
import { paths } from '../../config/paths';
import { useCurrentUser } from '../../features/auth/api/get-session';
import { useClub } from '../../features/club/api/get-club';

const AREAS = [
  {
    title: 'Size your ground tackle',
    text: 'Work out anchor holding, chain and rode, snubber and scope from your boat and the wind you plan for, with the engineering shown step by step.',
  },
  {
    title: 'Trade used gear',
    text: 'List the anchor, chain or rode you no longer need and find gear that fits your boat, close to your home harbour.',
  },
  {
    title: 'Share setups that work',
    text: "Read and post members' tried ground-tackle setups and questions, checked by the club's moderators before they go out.",
  },
  {
    title: 'Pay your dues',
    text: 'See when your membership runs to and pay online, or let the treasurer record a cheque, cash or transfer.',
  },
] as const;

/** The welcome screen: what Rodewise does for members, and a greeting once signed in. */
export function HomeRoute() {
  const { user } = useCurrentUser();
  const club = useClub();
  const clubName = club.data?.name ?? 'your club';
  return (
    <Page
      title={user ? `Welcome back, ${user.displayName}` : 'Welcome aboard'}
      intro={
        <p>
          Rodewise is where members of {clubName} pool what they know about anchoring and gear:
          sizing ground tackle with real engineering, trading used gear, sharing setups the club has
          vetted and paying dues.
        </p>
      }
    >
      {!user && (
        <div className="flex flex-wrap gap-3">
          <Link
            to={paths.signUp.href()}
            className="inline-flex min-h-11 items-center rounded-md bg-signal-600 px-4 font-bold text-white no-underline hover:bg-signal-700 hover:text-white"
          >
            Join the club online
          </Link>
          <Link
            to={paths.signIn.href()}
            className="inline-flex min-h-11 items-center rounded-md border border-sand-500 bg-sand-50 px-4 font-bold text-ink-900 no-underline hover:bg-sand-200"
          >
            Sign in
          </Link>
        </div>
      )}
      <ul className="grid gap-4 sm:grid-cols-2">
        {AREAS.map((area) => (
          <li
            key={area.title}
            className="rounded-lg border border-sand-300 bg-sand-50 p-5 shadow-card"
          >
            <h2 className="mb-2 text-lg">{area.title}</h2>
            <p className="text-sm text-ink-700">{area.text}</p>
          </li>
        ))}
      </ul>
    </Page>
  );
}
