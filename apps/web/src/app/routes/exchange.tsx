import { useSearchParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { LinkButton } from '@/components/ui/link-button';
import { Page } from '@/components/ui/page';
import { QueryStatus } from '@/components/ui/query-status';
import { TitledSection } from '@/components/ui/titled-section';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { useBoats } from '@/features/boats/api/get-boats';
import { useClub } from '@/features/club/api/get-club';
import { useListingSearch } from '@/features/exchange/api/search-listings';
import { ListingCard } from '@/features/exchange/components/listing-card';
import { SaveSearchButton } from '@/features/exchange/components/save-search-button';
import { SearchFilters } from '@/features/exchange/components/search-filters';
import { SEARCH_KEYS } from '@/features/exchange/utils/filters';
import { countOf } from '@/lib/plural';

/** The exchange: search with filters, "fits my boat" flags, and results. */
export function ExchangeRoute() {
  const [params, setParams] = useSearchParams();
  const { user } = useCurrentUser();
  const club = useClub();
  const boats = useBoats();
  const filters: Record<string, string> = {};
  for (const k of SEARCH_KEYS) {
    const v = params.get(k);
    if (v) filters[k] = v;
  }
  const search = useListingSearch(filters);
  const fieldErrors = search.error instanceof ApiError ? search.error.fields : {};
  const page = Number(filters.page ?? '1');
  const meta = search.data?.meta;
  const pages = meta ? Math.max(1, Math.ceil(meta.total / meta.pageSize)) : 1;
  // Typing replaces the address instead of adding a history entry per pause; lists and pages push one.
  const apply = (next: Record<string, string | number | undefined>, replace = false) => {
    const p = new URLSearchParams();
    for (const [k, v] of Object.entries(next)) if (v !== undefined && v !== '') p.set(k, String(v));
    setParams(p, { replace });
  };
  return (
    <Page
      title="Gear exchange"
      intro={
        <p>
          Used anchors, chain, rode and fittings from club members, close to your harbour. Choose a
          boat to see what is strong enough for it.
        </p>
      }
    >
      <div className="flex flex-wrap gap-3">
        {user && (
          <>
            <LinkButton to={paths.listingNew.href()}>List gear</LinkButton>
            <LinkButton to={paths.exchangeMine.href()} variant="outline">
              My listings
            </LinkButton>
          </>
        )}
      </div>
      <SearchFilters
        value={filters}
        harbors={club.data?.harbors ?? []}
        boats={user ? (boats.data ?? []) : []}
        errors={fieldErrors}
        onChange={(next, { typing }) => apply(next, typing)}
      />
      {meta?.fitBasis && (
        <Alert
          tone="info"
          title={`Checked against ${meta.fitBasis.boatName} at ${meta.fitBasis.windKn} kn`}
        >
          <p>{meta.fitBasis.explanation}</p>
          <details className="mt-2">
            <summary className="cursor-pointer font-bold">Before you rely on used gear</summary>
            <ul className="mt-1 list-disc pl-5">
              {meta.fitBasis.cautions.map((c) => (
                <li key={c}>{c}</li>
              ))}
            </ul>
          </details>
        </Alert>
      )}
      {user && <SaveSearchButton filters={filters} />}
      <TitledSection
        headingId="results-heading"
        title={meta ? countOf(meta.total, 'listing', 'listings') : 'Listings'}
      >
        <QueryStatus query={search} loadingLabel="Searching…" errorTitle="Search did not work" />
        {search.data?.data.length === 0 && (
          <EmptyState title="Nothing matches yet">
            Try fewer filters, or save this search to hear about new gear.
          </EmptyState>
        )}
        {search.data && search.data.data.length > 0 && (
          <ul className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {search.data.data.map((l) => (
              <ListingCard
                key={l.id}
                listing={l}
                href={paths.listing.href(
                  l.id,
                  filters.fitsBoat ? Number(filters.fitsBoat) : undefined,
                )}
              />
            ))}
          </ul>
        )}
        {pages > 1 && (
          <nav aria-label="Result pages" className="flex items-center gap-3">
            <Button
              variant="secondary"
              disabled={page <= 1}
              onClick={() => apply({ ...filters, page: page - 1 })}
            >
              Previous
            </Button>
            <span className="text-sm">
              Page {page} of {pages}
            </span>
            <Button
              variant="secondary"
              disabled={page >= pages}
              onClick={() => apply({ ...filters, page: page + 1 })}
            >
              Next
            </Button>
          </nav>
        )}
      </TitledSection>
    </Page>
  );
}
