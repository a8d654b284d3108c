import type { PlanDto } from '@app/shared';
import { PLAN_KIND_LABELS, PRORATION_LABELS } from '@app/shared/values';
import { formatMoney } from '@app/shared/locale';
import { Suspense, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { useCreateMembershipPlan, useUpdateMembershipPlan } from '../api/save-membership-plan';
import { Spinner } from '@/components/ui/spinner';
import { TitledSection } from '@/components/ui/titled-section';
import { lazyNamed } from '@/lib/lazy-named';

// Opened by Edit or New plan, so the form (and the form library) loads then.
const MembershipPlanForm = lazyNamed(() => import('./membership-plan-form'), 'MembershipPlanForm');

function PlanCard({ plan }: { plan: PlanDto }) {
  const update = useUpdateMembershipPlan();
  const [isEditing, setIsEditing] = useState(false);
  const [saved, setSaved] = useState(false);
  const headingId = `plan-${plan.id}-name`;
  return (
    <li
      aria-labelledby={headingId}
      className="flex flex-col gap-3 rounded-lg border border-sand-300 bg-sand-50 p-4"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={headingId} className="text-lg">
          {plan.name}{' '}
          <span className="text-sm font-normal text-ink-700">
            ({PLAN_KIND_LABELS[plan.kind]}, code {plan.code})
          </span>
        </h3>
        <span
          className={
            plan.active
              ? 'rounded-full bg-signal-600 px-2 text-sm font-bold text-white'
              : 'rounded-full border border-ink-700 px-2 text-sm font-bold text-ink-800'
          }
        >
          {plan.active ? 'Open' : 'Retired'}
        </span>
      </div>
      <dl className="grid gap-x-4 gap-y-1 text-sm sm:grid-cols-[auto_1fr]">
        <dt className="font-bold">Annual amount</dt>
        <dd className="tabular-nums">{formatMoney(plan.amountMinor, plan.currency)}</dd>
        <dt className="font-bold">Joining mid-year</dt>
        <dd>{PRORATION_LABELS[plan.proration]}</dd>
        <dt className="font-bold">Late fee</dt>
        <dd>
          {plan.lateFeeMinor > 0
            ? `${formatMoney(plan.lateFeeMinor, plan.currency)} after ${plan.graceDays} days’ grace`
            : `None; ${plan.graceDays} days’ grace`}
        </dd>
      </dl>
      {plan.description && <p className="text-sm">{plan.description}</p>}
      {saved && !isEditing && (
        <p role="status" className="text-sm font-bold">
          Saved.
        </p>
      )}
      {isEditing ? (
        <Suspense fallback={<Spinner label="Loading the form…" />}>
          <MembershipPlanForm
            plan={plan}
            isPending={update.isPending}
            onCancel={() => setIsEditing(false)}
            onSubmit={async ({ code: _code, ...patch }) => {
              await update.mutateAsync({ planId: plan.id, ...patch });
              setIsEditing(false);
              setSaved(true);
            }}
          />
        </Suspense>
      ) : (
        <div>
          <Button
            size="sm"
            variant="secondary"
            onClick={() => {
              setSaved(false);
              setIsEditing(true);
            }}
            aria-label={`Change ${plan.name}`}
          >
            Change
          </Button>
        </div>
      )}
    </li>
  );
}

/** Every plan as a card with its terms and a change form, and a form for a new plan. */
export function MembershipPlanList({ plans }: { plans: PlanDto[] }) {
  const create = useCreateMembershipPlan();
  const [isAdding, setIsAdding] = useState(false);
  const [created, setCreated] = useState<string | null>(null);
  return (
    <div className="flex flex-col gap-4">
      {created && (
        <Alert tone="success" title="Membership plan created">
          <p>{created} is open to members now.</p>
        </Alert>
      )}
      {isAdding ? (
        <TitledSection
          headingId="new-plan-heading"
          title="New plan"
          level={3}
          className="rounded-lg border border-sand-300 p-4"
          headingClassName="mb-3 text-lg"
        >
          <Suspense fallback={<Spinner label="Loading the form…" />}>
            <MembershipPlanForm
              isPending={create.isPending}
              onCancel={() => setIsAdding(false)}
              onSubmit={async (input) => {
                const plan = await create.mutateAsync(input);
                setIsAdding(false);
                setCreated(plan.active ? plan.name : null);
              }}
            />
          </Suspense>
        </TitledSection>
      ) : (
        <div>
          <Button
            onClick={() => {
              setCreated(null);
              setIsAdding(true);
            }}
          >
            Add a plan
          </Button>
        </div>
      )}
      {plans.length === 0 ? (
        <p>No plans yet. Add one so members can pay their dues.</p>
      ) : (
        <ul className="flex flex-col gap-3" aria-label="Membership plans">
          {plans.map((p) => (
            <PlanCard key={p.id} plan={p} />
          ))}
        </ul>
      )}
    </div>
  );
}
