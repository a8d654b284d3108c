import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { authKeys } from '@/features/auth/api/keys';
import { clubKeys } from '@/features/club/api/keys';
import { seedFromPage } from './boot-data';

const club = {
  name: 'Test Cove Sailing Club',
  harbors: [{ id: 1, name: 'North Basin', slug: 'north-basin' }],
  locale: { region: 'en-GB', currency: 'EUR', unitSystem: 'metric' },
};

function pageWith(block: string | null): Document {
  const doc = document.implementation.createHTMLDocument('t');
  if (block !== null) {
    const el = doc.createElement('script');
    el.type = 'application/json';
    el.id = 'rw-boot';
    el.textContent = block;
    doc.head.append(el);
  }
  return doc;
}

describe('seedFromPage', () => {
  it('seeds the club and, for a visitor, a session that is already stale so the real one is fetched', () => {
    const qc = new QueryClient();
    seedFromPage(qc, pageWith(JSON.stringify({ club, visitor: true })));
    expect(qc.getQueryData(clubKeys.detail())).toEqual(club);
    expect(qc.getQueryData(authKeys.session())).toEqual({ user: null, csrfToken: '' });
    const session = qc.getQueryCache().find({ queryKey: authKeys.session() });
    expect(session?.isStaleByTime(5 * 60_000)).toBe(true);
    expect(qc.getQueryCache().find({ queryKey: clubKeys.detail() })?.isStaleByTime(60_000)).toBe(
      false,
    );
  });

  it('leaves the session to the API when the request carried a session cookie', () => {
    const qc = new QueryClient();
    seedFromPage(qc, pageWith(JSON.stringify({ club, visitor: false })));
    expect(qc.getQueryData(authKeys.session())).toBeUndefined();
    expect(qc.getQueryData(clubKeys.detail())).toEqual(club);
  });

  it('seeds nothing from a page without the block, a malformed block or a club of the wrong shape', () => {
    for (const block of [null, '{not json', '"a string"', JSON.stringify({ club: { name: 3 } })]) {
      const qc = new QueryClient();
      seedFromPage(qc, pageWith(block));
      expect(qc.getQueryCache().getAll()).toHaveLength(0);
    }
  });
});
