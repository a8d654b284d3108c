import type { RatedComponent, TacklePlanResult } from '@app/calc';
import { Suspense, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Page } from '@/components/ui/page';
import { UnavailablePage } from '@/components/ui/unavailable-page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { errorMessage } from '@/lib/form-errors';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { WeakestLinkTable } from '@/features/calculators/components/weakest-link-table';
import { RecommendationColumn } from '@/features/boats/components/recommendation-column';
import { useDeleteTacklePlan } from '@/features/tackle-plans/api/delete-tackle-plan';
import { useTacklePlan } from '@/features/tackle-plans/api/get-tackle-plan';
import { useUpdateTacklePlan } from '@/features/tackle-plans/api/update-tackle-plan';
import { ConnectorEditor } from '@/features/tackle-plans/components/connector-editor';
import { TacklePlanCard } from '@/features/tackle-plans/components/tackle-plan-card';
import { PrintStyles } from '@/features/tackle-plans/components/print-styles';
import { UnitToggle } from '@/components/units/unit-toggle';
import { TackleUnits } from './calculators-units';
import { IdParams } from '../id-params';
import { lazyNamed } from '@/lib/lazy-named';

// The rode's drawing sits at the foot of the page: it loads after the card and the checks have painted.
const CatenaryDrawing = lazyNamed(
  () => import('@/features/calculators/components/catenary-drawing'),
  'CatenaryDrawing',
);

/** The parts `tacklePlan` checked, in the order it passed them to `weakestLink`. */
function linkParts(result: TacklePlanResult): RatedComponent[] {
  const parts: RatedComponent[] = [];
  if (result.chain) parts.push({ label: 'chain', ...result.chain });
  if (result.rode) parts.push({ label: 'rope rode', ...result.rode });
  for (const c of result.connectors) parts.push(c);
  return parts.map(({ label, wllN, minBreakN }) => ({ label, wllN, minBreakN }));
}

function TacklePlanScreen({ planId }: { planId: number }) {
  const query = useTacklePlan(planId);
  const update = useUpdateTacklePlan(planId);
  const remove = useDeleteTacklePlan();
  const navigate = useNavigate();
  const [confirmDelete, setConfirmDelete] = useState(false);
  if (query.isPending) return <Spinner label="Loading the plan…" />;
  if (query.isError) {
    return (
      <UnavailablePage
        title="Plan not available"
        reason="Couldn't load this plan"
        back={{ to: paths.boats.href(), label: 'Back to your boats' }}
      >
        <p>{errorMessage(query.error)}</p>
      </UnavailablePage>
    );
  }
  const { plan, boat, result } = query.data;
  const link = result.weakestLink;
  return (
    <Page
      title={`${plan.name}`}
      intro={<p className="print:hidden">Tackle plan for {boat.name}.</p>}
    >
      <PrintStyles />
      <div className="flex flex-wrap items-center justify-between gap-3 print:hidden">
        <UnitToggle />
        <div className="flex gap-2">
          <Link to={paths.boat.href(boat.id)} className="inline-flex min-h-11 items-center">
            Back to {boat.name}
          </Link>
          <Button onClick={() => window.print()}>Print card</Button>
        </div>
      </div>
      <TacklePlanCard data={query.data} />
      {result.recommendation && (
        <section aria-labelledby="rec-heading" className="flex flex-col gap-3 print:hidden">
          <h2 id="rec-heading" className="text-xl">
            What Rodewise would carry for this plan
          </h2>
          <p className="text-sm text-ink-700">
            The same recommendation as on the boat page, for this plan&apos;s wind, depth, tide and
            seabed, so you can compare it with your gear above.
          </p>
          <RecommendationColumn
            title={`Recommendation at ${plan.windKn} kn`}
            rec={result.recommendation}
          />
        </section>
      )}
      <section aria-labelledby="link-heading" className="flex flex-col gap-3 print:hidden">
        <h2 id="link-heading" className="text-xl">
          Weakest-link check of your gear
        </h2>
        <p className="text-sm text-ink-700">
          Add every shackle, swivel and splice between anchor and boat; the margins update from the
          saved plan.
        </p>
        {link ? (
          <WeakestLinkTable
            parts={linkParts(result)}
            result={link}
            caption={
              result.peakFactor < 1
                ? `At ${Math.round(result.peakFactor * 100)} % of the design load (storm credit for the nylon in the rode)`
                : 'At the design load of the plan'
            }
          />
        ) : (
          <p className="text-sm">No rated parts yet: add the chain or a fitting.</p>
        )}
        <ConnectorEditor
          connectors={plan.components.connectors}
          isPending={update.isPending}
          error={update.isError ? errorMessage(update.error) : undefined}
          onSave={(connectors) =>
            update.mutateAsync({ components: { ...plan.components, connectors } })
          }
        />
      </section>
      {result.catenary && (
        <section aria-labelledby="shape-heading" className="flex flex-col gap-3 print:hidden">
          <h2 id="shape-heading" className="text-xl">
            The rode under the design load
          </h2>
          <Suspense fallback={<Spinner label="Drawing the rode…" />}>
            <CatenaryDrawing
              result={result.catenary}
              waterLevelM={plan.depthM + plan.tideM}
              hasRope={(plan.components.rode?.lengthM ?? 0) > 0}
            />
          </Suspense>
          <p className="text-xs text-ink-600">{result.catenary.basis}</p>
        </section>
      )}
      <div className="print:hidden">
        <Button variant="danger" onClick={() => setConfirmDelete(true)}>
          Delete this plan
        </Button>
      </div>
      <ConfirmDialog
        isOpen={confirmDelete}
        title={`Delete ${plan.name}?`}
        confirmLabel="Delete plan"
        isDestructive
        isPending={remove.isPending}
        onCancel={() => setConfirmDelete(false)}
        onConfirm={() =>
          remove.mutate(planId, { onSuccess: () => void navigate(paths.boat.href(boat.id)) })
        }
      >
        <p>
          The plan and its fittings are removed from {boat.name}; the boat and its other plans stay.
          This cannot be undone.
        </p>
        {remove.isError && <p role="alert">{errorMessage(remove.error)}</p>}
      </ConfirmDialog>
    </Page>
  );
}

/** A saved tackle plan: the printable card, the weakest-link check and the rode's shape. */
export function TacklePlanRoute() {
  return (
    <RequireAuth>
      <TackleUnits>
        <IdParams
          names={['planId']}
          unavailable={{
            title: 'Plan not available',
            reason: 'No such plan',
            back: { to: paths.boats.href(), label: 'Back to your boats' },
          }}
        >
          {({ planId }) => <TacklePlanScreen planId={planId} />}
        </IdParams>
      </TackleUnits>
    </RequireAuth>
  );
}
