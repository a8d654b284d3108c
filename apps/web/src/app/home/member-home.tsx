import type { UserDto } from '@app/shared';
import { useBoats } from '@/features/boats/api/get-boats';
import { DuesCard } from './dues-card';
import { ListingsCard } from './listings-card';
import { MyBoatsCard } from './my-boats-card';
import { MyListingsCard } from './my-listings-card';
import { NoticesCard } from './notices-card';
import { ModeratorQueue, TreasurerQueue } from './officer-queues';
import { PostsCard } from './posts-card';
import { hasModeratorRole, hasRole } from '@/lib/roles';

/** Gear on the exchange that fits the member's first boat, near its home harbour when it has one. */
function FitsMyBoat() {
  const boats = useBoats();
  const boat = boats.data?.[0];
  if (!boat) return null;
  const filters: Record<string, string> = { fitsBoat: String(boat.id), fitsOnly: 'true' };
  if (boat.homeHarborId) filters.harborId = String(boat.homeHarborId);
  return (
    <ListingsCard
      title={`Gear that fits ${boat.name}`}
      filters={filters}
      fitsBoat={boat.id}
      empty={`No listing near ${boat.name}'s harbour fits her right now.`}
    />
  );
}

/** The signed-in home: the officer's queues first, then the member's boats, dues, notices and finds. */
export function MemberHome({ user }: { user: UserDto }) {
  const hasModeratorDesk = hasModeratorRole(user);
  const isTreasurer = hasRole(user, 'treasurer');
  return (
    <>
      {(hasModeratorDesk || isTreasurer) && (
        <div className="grid gap-4 md:grid-cols-2" aria-label="Your desks" role="group">
          {hasModeratorDesk && <ModeratorQueue />}
          {isTreasurer && <TreasurerQueue />}
        </div>
      )}
      <div className="grid gap-4 md:grid-cols-2">
        <MyBoatsCard />
        {hasRole(user, 'member') && <DuesCard />}
        <NoticesCard />
        <FitsMyBoat />
        <MyListingsCard />
        <PostsCard title="Open questions" show="open-questions" />
      </div>
    </>
  );
}
