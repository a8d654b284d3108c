import { Page } from '@/components/ui/page';
import { LinkButton } from '@/components/ui/link-button';
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
        <LinkButton to={paths.signUp.href()}>Join the club online</LinkButton>
        <LinkButton to={paths.signIn.href()} variant="secondary">
          Sign in
        </LinkButton>
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
