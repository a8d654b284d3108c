import type { DuesQuoteDto } from '@app/shared';
import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { ErrorAlert, QueryStatus } from '@/components/ui/query-status';
import { TitledSection } from '@/components/ui/titled-section';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useMyDues } from '@/features/dues/api/get-my-dues';
import { useStartCheckout } from '@/features/dues/api/start-checkout';
import { PaymentHistory } from '@/features/dues/components/payment-history';
import { QuoteCard } from '@/features/dues/components/quote-card';
import { DuesStatusBadge } from '@/features/dues/components/status-badge';
import { readableDate } from '@/lib/format-date';

function DuesScreen() {
  const dues = useMyDues();
  const checkout = useStartCheckout();
  const [params] = useSearchParams();
  const [payingPlan, setPayingPlan] = useState<number | null>(null);
  const pay = (planId?: number) => {
    setPayingPlan(planId ?? null);
    checkout.mutate(planId ? { planId } : {}, {
      onSuccess: ({ url }) => window.location.assign(url),
    });
  };
  const d = dues.data;
  // A member who has never paid may still pick another plan; the checkout takes the chosen one.
  const otherOffers = d?.offers.filter((o) => o.planId !== d.quote?.planId) ?? [];
  // A plan the member may join instead, with its own pay button.
  const offerCard = (o: DuesQuoteDto) => (
    <QuoteCard
      key={o.planId}
      quote={o}
      payLabel={`Join as ${o.planName}`}
      onPay={() => pay(o.planId)}
      isPending={checkout.isPending && payingPlan === o.planId}
    />
  );
  return (
    <Page
      title="Dues"
      width="narrow"
      intro={<p>What your membership covers, what is owed and why, and a one-minute way to pay.</p>}
    >
      {params.get('checkout') === 'cancelled' && (
        <Alert tone="info" title="Card payment stopped">
          <p>You left the payment page; nothing was charged and your dues are as they were.</p>
        </Alert>
      )}
      <QueryStatus
        query={dues}
        loadingLabel="Loading your dues…"
        errorTitle="Couldn't load your dues"
      />
      {checkout.isError && (
        <ErrorAlert title="Couldn't open the card payment page" error={checkout.error} />
      )}
      {d && (
        <>
          <TitledSection
            headingId="membership-heading"
            title="Your membership"
            className="flex flex-col gap-2"
          >
            {d.membership ? (
              <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
                <dt className="font-bold">Plan</dt>
                <dd>{d.membership.planName}</dd>
                <dt className="font-bold">Status</dt>
                <dd>
                  <DuesStatusBadge status={d.status} />
                </dd>
                <dt className="font-bold">Paid through</dt>
                <dd data-testid="paid-through">
                  {d.membership.paidThrough
                    ? readableDate(d.membership.paidThrough)
                    : 'Not paid yet'}
                </dd>
                <dt className="font-bold">Fiscal year</dt>
                <dd>
                  {d.fiscalYear.label} ({readableDate(d.fiscalYear.start)} to{' '}
                  {readableDate(d.fiscalYear.end)})
                </dd>
              </dl>
            ) : (
              <p>You have no membership plan yet. Choose one below to join for this fiscal year.</p>
            )}
          </TitledSection>
          <TitledSection headingId="owed-heading" title="What is owed">
            {d.quote && (
              <QuoteCard
                quote={d.quote}
                onPay={() => pay()}
                isPending={checkout.isPending && payingPlan === null}
              />
            )}
            {d.quote && d.membership && !d.membership.paidThrough && otherOffers.length > 0 && (
              <div className="flex flex-col gap-3">
                <p className="font-bold">Not paid yet, so you can still join on another plan:</p>
                {otherOffers.map(offerCard)}
              </div>
            )}
            {!d.quote && d.offers.length === 0 && (
              <Alert tone="success" title="Nothing to pay">
                <p>
                  Your dues are up to date. Renewal opens a month before your paid-through date.
                </p>
              </Alert>
            )}
            {!d.quote && d.offers.length > 0 && (
              <div className="grid gap-3">{d.offers.map(offerCard)}</div>
            )}
            <p className="text-sm text-ink-700">
              Card payments open the payment provider’s secure page. You can also pay the treasurer
              by cheque, cash or bank transfer.
            </p>
          </TitledSection>
          <TitledSection
            headingId="history-heading"
            title="Your payments"
            className="flex flex-col gap-2"
          >
            <PaymentHistory payments={d.payments} />
          </TitledSection>
        </>
      )}
    </Page>
  );
}

/** The member's dues page. */
export function DuesRoute() {
  return (
    <RequireAuth>
      <DuesScreen />
    </RequireAuth>
  );
}
