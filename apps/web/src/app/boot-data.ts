import type { ClubDto, SessionDto } from '@app/shared';
import type { QueryClient } from '@tanstack/react-query';
import { authKeys } from '@/features/auth/api/keys';
import { clubKeys } from '@/features/club/api/keys';

interface BootData {
  club?: ClubDto | null;
  visitor?: boolean;
}

function readBootData(doc: Document): BootData {
  const text = doc.getElementById('rw-boot')?.textContent;
  if (!text) return {};
  try {
    const data: unknown = JSON.parse(text);
    return typeof data === 'object' && data !== null ? data : {};
  } catch {
    return {};
  }
}

/**
 * Seeds the query cache from the boot data the server writes into index.html (apps/api static-assets.ts): the club,
 * so its name is there on the first render, and, for a request that came without a session cookie, a visitor's
 * session, so the visitor's screen renders without waiting for GET /api/auth/me. That session is marked as
 * old, so the real one (with its CSRF token) is still fetched at once behind it. Without boot data (the Vite dev
 * server, a malformed block) nothing is seeded and the queries fetch as usual.
 */
export function seedFromPage(queryClient: QueryClient, doc: Document = document) {
  const boot = readBootData(doc);
  if (boot.club && typeof boot.club.name === 'string' && Array.isArray(boot.club.harbors))
    queryClient.setQueryData<ClubDto>(clubKeys.detail(), boot.club);
  if (boot.visitor === true)
    queryClient.setQueryData<SessionDto>(
      authKeys.session(),
      { user: null, csrfToken: '' },
      { updatedAt: 0 },
    );
}
