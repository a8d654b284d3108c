// Helpers the fault drills share: a signed-in HTTP session against a running API process, and SQL reads.
import { rootSql, type DbConfig } from '@app/devkit/mariadb';

/** Rows of a query run as root over the instance's socket, each row an array of column strings (header dropped). */
export function sqlRows(cfg: DbConfig, db: string, query: string): string[][] {
  return rootSql(cfg, `USE \`${db}\`; ${query}`)
    .split('\n')
    .slice(1)
    .filter(Boolean)
    .map((line) => line.split('\t'));
}

/** The single number a `SELECT COUNT(*) …` (or any one-cell query) returns. */
export function sqlNumber(cfg: DbConfig, db: string, query: string): number {
  const cell = sqlRows(cfg, db, query)[0]?.[0];
  if (cell === undefined) throw new Error(`no result for: ${query}`);
  return Number(cell);
}

const sidOf = (res: Response) =>
  res.headers
    .getSetCookie()
    .filter((c) => c.startsWith('rw.sid=') || c.startsWith('rw.vcsrf='))
    .map((c) => c.split(';')[0])
    .join('; ');

export interface DrillSession {
  cookie: string;
  csrf: string;
  /** A JSON request with the session cookie and CSRF token. */
  send: (method: string, path: string, body?: unknown) => Promise<Response>;
}

/** Signs in through the real login route of the API at `base` (e.g. http://127.0.0.1:4910). */
export async function signIn(base: string, email: string, password: string): Promise<DrillSession> {
  const me = await fetch(`${base}/api/auth/me`);
  let cookie = sidOf(me) ?? '';
  let csrf = ((await me.json()) as { data: { csrfToken: string } }).data.csrfToken;
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { cookie, 'content-type': 'application/json', 'x-csrf-token': csrf },
    body: JSON.stringify({ email, password }),
  });
  if (login.status !== 200) throw new Error(`sign-in as ${email} answered ${login.status}`);
  cookie = sidOf(login) || cookie;
  csrf = ((await login.json()) as { data: { csrfToken: string } }).data.csrfToken;
  const session: DrillSession = {
    cookie,
    csrf,
    send: (method, path, body) =>
      fetch(`${base}${path}`, {
        method,
        headers: {
          cookie: session.cookie,
          'x-csrf-token': session.csrf,
          ...(body === undefined ? {} : { 'content-type': 'application/json' }),
        },
        body: body === undefined ? undefined : JSON.stringify(body),
      }),
  };
  return session;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Polls `check` until it returns something truthy; throws with `what` after `ms`. */
export async function waitUntil<T>(
  what: string,
  check: () => Promise<T | null | undefined | false> | T | null | undefined | false,
  ms = 15000,
): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await check();
    if (v) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await sleep(100);
  }
}
