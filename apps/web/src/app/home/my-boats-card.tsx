import { chainGradeWords, inchFractionLabel } from '@app/calc';
import type { BoatDto, TacklePlanDto } from '@app/shared';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useBoats } from '@/features/boats/api/get-boats';
import { useTacklePlans } from '@/features/tackle-plans/api/get-tackle-plans';
import { Quantity } from '@/components/units/quantity';
import { HomeCard, HomeEmpty } from './home-card';

const ANCHOR_WORDS: Record<string, string> = { scoop: 'scoop / roll-bar' };

function chainSize(chain: NonNullable<TacklePlanDto['components']['chain']>): string {
  const size =
    chain.nominalMm !== undefined
      ? `${chain.nominalMm} mm`
      : chain.tradeSizeIn !== undefined
        ? inchFractionLabel(chain.tradeSizeIn)
        : '?';
  return `${size} ${chainGradeWords(chain.grade)}`;
}

/** A plan's headline: anchor type and mass, chain size and length, rope if any. */
function PlanHeadline({ plan }: { plan: TacklePlanDto }) {
  const { anchor, chain, rode } = plan.components;
  return (
    <ul className="flex flex-col gap-0.5 text-ink-700">
      {anchor && (
        <li>
          Anchor: {ANCHOR_WORDS[anchor.type] ?? anchor.type},{' '}
          <Quantity value={anchor.massKg} kind="mass" />
        </li>
      )}
      {chain && (
        <li>
          Chain: {chainSize(chain)}, <Quantity value={chain.lengthM} kind="length" />
        </li>
      )}
      {rode && (
        <li>
          Rope: {rode.material} {rode.construction}, <Quantity value={rode.lengthM} kind="length" />
        </li>
      )}
      {!anchor && !chain && !rode && <li>No gear chosen yet.</li>}
    </ul>
  );
}

function BoatLine({ boat }: { boat: BoatDto }) {
  const plans = useTacklePlans(boat.id);
  const latest = plans.data?.[0];
  return (
    <li className="flex flex-col gap-1 border-t border-sand-300 pt-2 first:border-t-0 first:pt-0">
      <p className="font-bold">
        <Link to={paths.boat.href(boat.id)}>{boat.name}</Link>{' '}
        <span className="font-normal text-ink-600">
          · <Quantity value={boat.loaM} kind="length" />
        </span>
      </p>
      {plans.isPending && <HomeEmpty>Loading the saved plans…</HomeEmpty>}
      {plans.data && !latest && (
        <p>
          No saved tackle plan yet.{' '}
          <Link to={paths.boat.href(boat.id)}>Get a recommendation for {boat.name}</Link>
        </p>
      )}
      {latest && (
        <>
          <p>
            Latest plan: <Link to={paths.tacklePlan.href(latest.id)}>{latest.name}</Link>
          </p>
          <PlanHeadline plan={latest} />
          <Link to={paths.boat.href(boat.id)} className="self-start">
            See the recommendation for {boat.name}
          </Link>
        </>
      )}
    </li>
  );
}

/** The member's boats, each with its newest saved plan's headline figures. */
export function MyBoatsCard() {
  const boats = useBoats();
  return (
    <HomeCard title="My boats" more={{ to: paths.boats.href(), label: 'All my boats' }}>
      {boats.isPending && <HomeEmpty>Loading your boats…</HomeEmpty>}
      {boats.isError && <HomeEmpty>Your boats could not be loaded.</HomeEmpty>}
      {boats.data && boats.data.length === 0 && (
        <p>
          Add your boat to get ground-tackle advice and see gear that fits it.{' '}
          <Link to={paths.boats.href()}>Add a boat</Link>
        </p>
      )}
      {boats.data && boats.data.length > 0 && (
        <ul className="flex flex-col gap-2">
          {boats.data.slice(0, 3).map((boat) => (
            <BoatLine key={boat.id} boat={boat} />
          ))}
        </ul>
      )}
    </HomeCard>
  );
}
