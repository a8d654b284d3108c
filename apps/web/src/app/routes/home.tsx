import { Link } from 'react-router-dom';
import { Page } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { useClub } from '@/features/club/api/get-club';
import { ListingsCard } from '../home/listings-card';
import { MemberHome } from '../home/member-home';
import { PostsCard } from '../home/posts-card';

/** The visitor's welcome: what the club does here, a way in, and what members share in public. */
function VisitorHome({ clubName }: { clubName: string }) {
  return (
    <>
      <p className="max-w-prose text-ink-700">
        Rodewise is where members of {clubName} pool what they know about anchoring and gear: sizing
        ground tackle with the engineering shown, trading used gear, sharing setups the club has
        vetted and paying dues.
      </p>
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
      <div className="grid gap-4 md:grid-cols-2">
        <PostsCard title="Recent posts" show="recent" />
        <ListingsCard
          title="Recent listings"
          filters={{}}
          empty="Nothing is listed on the exchange right now."
        />
      </div>
    </>
  );
}

/** Home: a member's own day (boats, dues, notices, finds, and an officer's queues); a welcome for visitors. */
export function HomeRoute() {
  const { user } = useCurrentUser();
  const club = useClub();
  const clubName = club.data?.name ?? 'your club';
  return (
    <Page title={user ? `Welcome back, ${user.displayName}` : 'Welcome aboard'}>
      {user === undefined ? null : user ? (
        <MemberHome user={user} />
      ) : (
        <VisitorHome clubName={clubName} />
      )}
    </Page>
  );
}
