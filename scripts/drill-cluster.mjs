#!/usr/bin/env node
// `npm run drill:cluster`: a bounded mixed load through HAProxy while one Galera node (the active writer, node1) and
// one API process stop and come back; then every acknowledged write is counted on every node. The load: posts,
// listings with a photo (multipart upload), messages between members and sellers, dues checkouts paid at the payment
// stand-in whose signed webhooks come back through HAProxy, and reads of all of them. Writes the result to
// docs/cluster-drill.md. Starts the cluster first when it is not running. Node built-ins only.
import { spawnSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { cpus } from 'node:os';
import { crc32, deflateSync } from 'node:zlib';
import { ROOT, rootSql } from '../packages/devkit/src/mariadb.mjs';
import {
  clusterPorts,
  nodeCfg,
  nodeStatus,
  startApi,
  startNode,
  stopDetached,
  stopNode,
  wsrepState,
} from './lib/cluster.mjs';

const ports = clusterPorts(5500, 3);
const BASE = `http://127.0.0.1:${ports.http}`;
const PAY = `http://127.0.0.1:${ports.payments}`;
const DURATION_MS = Number(process.env.DRILL_MS ?? 40_000);
const WORKERS = 4; // two cores: keep the load bounded
const STOP_AT = 8_000;
const BACK_AT = 20_000;
const RETRY_WINDOW_MS = 5_000; // 502/503/504 and cut connections allowed only this long after a stop or a start
const PASSWORD = 'harbour-demo-2026'; // the demo seed's password; drill members copy its hash
const MESSAGE_BUDGET = 25; // per member, under the API's 30 messages per 10 minutes
const PAYERS_PER_WORKER = 4;
const WRITERS_PER_WORKER = 3;
const run = Date.now().toString(36);
const TAG = `Cluster drill ${run}`;
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));
const pick = (list) => list[Math.floor(Math.random() * list.length)];
const node1 = nodeCfg(ports.nodes[0]);

async function ensureCluster() {
  const ok = await fetch(`${BASE}/api/health`).then(
    (r) => r.ok,
    () => false,
  );
  if (ok) return;
  const r = spawnSync(process.execPath, [join(ROOT, 'scripts', 'cluster.mjs')], {
    stdio: 'inherit',
  });
  if (r.status !== 0) throw new Error('npm run cluster failed');
}

/** Rows of a query on one node (root over its socket), after the node has applied every earlier commit. */
function rows(cfg, query) {
  return rootSql(cfg, `SET SESSION wsrep_sync_wait = 1; USE rodewise; ${query}`)
    .trim()
    .split('\n')
    .slice(1)
    .filter(Boolean)
    .map((l) => l.split('\t'));
}
const q = (s) => `'${String(s).replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;

/** Drill members, written on node1 before the load: they copy a demo member's password hash and role. */
function createMembers() {
  const [[hash]] = rows(
    node1,
    "SELECT password_hash FROM users WHERE email = 'maren@larkspit.example'",
  );
  const [[planId]] = rows(node1, "SELECT id FROM membership_plans WHERE code = 'individual'");
  const make = (kind, n, paidThrough) =>
    Array.from({ length: n }, (_, i) => ({
      kind,
      email: `drill-${run}-${kind}-${i + 1}@larkspit.example`,
      name: `Drill ${kind} ${i + 1}`,
      paidThrough,
    }));
  const members = [
    ...make('seller', WORKERS, 'DATE_ADD(CURDATE(), INTERVAL 400 DAY)'),
    ...make('writer', WORKERS * WRITERS_PER_WORKER, 'DATE_ADD(CURDATE(), INTERVAL 400 DAY)'),
    // Owing members: joined today, never paid, so each has one dues checkout to make.
    ...make('payer', WORKERS * PAYERS_PER_WORKER, 'NULL'),
  ];
  const sql = members
    .map(
      (
        m,
      ) => `INSERT INTO users (email, display_name, password_hash, email_verified_at, created_at, updated_at)
        VALUES (${q(m.email)}, ${q(m.name)}, ${q(hash)}, NOW(), NOW(), NOW());
      SET @u = LAST_INSERT_ID();
      INSERT INTO user_roles (user_id, role, created_at) VALUES (@u, 'member', NOW());
      INSERT INTO memberships (user_id, plan_id, joined_on, paid_through, created_at, updated_at)
        VALUES (@u, ${planId}, CURDATE(), ${m.paidThrough}, NOW(), NOW());`,
    )
    .join('\n');
  rootSql(node1, `USE rodewise; ${sql}`);
  return members;
}

/** A signed-in member: cookies kept like a browser, every state-changing call with the CSRF token. */
async function signIn(email) {
  const jar = new Map();
  let token = '';
  const keep = (res) => {
    for (const c of res.headers.getSetCookie?.() ?? []) {
      const [pair] = c.split(';');
      const at = pair.indexOf('=');
      jar.set(pair.slice(0, at), pair.slice(at + 1));
    }
  };
  const cookie = () => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
  const call = async (method, path, body) => {
    const form = body instanceof FormData;
    const res = await fetch(`${BASE}${path}`, {
      method,
      headers: {
        ...(body && !form ? { 'content-type': 'application/json' } : {}),
        ...(jar.size ? { cookie: cookie() } : {}),
        ...(method !== 'GET' && token ? { 'x-csrf-token': token } : {}),
      },
      body: form ? body : body ? JSON.stringify(body) : undefined,
    });
    keep(res);
    const json = await res.json().catch(() => null);
    return { status: res.status, json };
  };
  const me = await call('GET', '/api/auth/me');
  token = me.json?.data?.csrfToken ?? '';
  const login = await call('POST', '/api/auth/login', { email, password: PASSWORD });
  if (login.status !== 200) throw new Error(`sign-in as ${email} answered ${login.status}`);
  token = login.json.data.csrfToken;
  return { email, call };
}

/** A small PNG (a gradient that differs per photo), built with zlib alone. */
function png(seed, w = 48, h = 32) {
  const chunk = (type, data) => {
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const td = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(crc32(td) >>> 0);
    return Buffer.concat([len, td, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr.set([8, 2, 0, 0, 0], 8); // 8-bit RGB
  const raw = Buffer.alloc((w * 3 + 1) * h);
  for (let y = 0; y < h; y += 1)
    for (let x = 0; x < w; x += 1) {
      const o = y * (w * 3 + 1) + 1 + x * 3;
      raw[o] = (x * 5 + seed * 17) & 255;
      raw[o + 1] = (y * 7 + seed * 29) & 255;
      raw[o + 2] = (seed * 53) & 255;
    }
  return Buffer.concat([
    Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(raw)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

const doc = (text) => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text }] }],
});

const KINDS = ['posts', 'listings', 'photos', 'messages', 'checkouts', 'reads'];

async function main() {
  await ensureCluster();
  const members = createMembers();
  console.log(`[drill] run ${run}: ${members.length} drill members; signing in ...`);
  const sessions = new Map();
  for (const m of members) sessions.set(m.email, await signIn(m.email));
  const byKind = (kind) => members.filter((m) => m.kind === kind).map((m) => sessions.get(m.email));
  const sellers = byKind('seller');
  const writers = byKind('writer');
  const payers = byKind('payer');

  let seq = 0;
  const t0 = Date.now();
  const stats = Object.fromEntries(
    KINDS.map((k) => [k, { requests: 0, acked: 0, rejected4xx: {}, errors: 0 }]),
  );
  const errors = []; // { at, status, what, kind }
  const events = [];
  const ack = {
    posts: [], // titles
    listings: [], // { id, title }
    photos: [], // { id, listingId, url }
    messages: [], // bodies
    checkouts: [], // { sessionId, email }
  };
  const activeListings = []; // listing ids open for messages
  const threadsOfSeller = new Map(); // seller email -> thread ids
  const sentBy = new Map(); // email -> messages sent
  const checkoutOf = new Map(); // payer email -> { sessionId, url, reused }

  /** One request, counted under `kind`; returns the answer, or null for a 5xx / cut connection. */
  const send = async (kind, who, method, path, body, okStatus) => {
    const s = stats[kind];
    s.requests += 1;
    const what = `${method} ${path.replace(/\d+/g, ':id')}`;
    try {
      const r = await who.call(method, path, body);
      if (r.status >= 500) {
        s.errors += 1;
        errors.push({
          at: Date.now() - t0,
          status: r.status,
          what,
          kind,
          code: r.json?.error?.code,
        });
        return null;
      }
      if (okStatus && r.status !== okStatus) {
        s.rejected4xx[r.status] = (s.rejected4xx[r.status] ?? 0) + 1;
        if (r.status !== 429)
          errors.push({
            at: Date.now() - t0,
            status: r.status,
            what,
            kind,
            code: r.json?.error?.code,
            unexpected: true,
          });
        return null;
      }
      return r;
    } catch (err) {
      s.errors += 1;
      errors.push({
        at: Date.now() - t0,
        status: 'network',
        what: `${what} ${err.cause?.code ?? err.message}`,
        kind,
      });
      return null;
    }
  };

  const writePost = async (me) => {
    const title = `${TAG} post ${++seq}`;
    const r = await send(
      'posts',
      me,
      'POST',
      '/api/posts',
      {
        kind: 'article',
        title,
        topicId: 1,
        body: doc(`Drill write ${seq}.`),
      },
      201,
    );
    if (r) {
      stats.posts.acked += 1;
      ack.posts.push(title);
    }
  };

  const writeListing = async (me) => {
    const title = `${TAG} listing ${++seq}`;
    const r = await send(
      'listings',
      me,
      'POST',
      '/api/listings',
      {
        category: 'other',
        specs: {},
        title,
        description: 'Spare gear from the drill locker; collect at the harbour.',
        condition: 'good',
        priceCents: 1500 + seq,
        currency: 'EUR',
        harborId: 1,
        publish: true,
      },
      201,
    );
    if (!r) return;
    const id = r.json.data.id;
    stats.listings.acked += 1;
    ack.listings.push({ id, title });
    activeListings.push({ id, seller: me.email });
    await addPhoto(me, id);
  };

  const addPhoto = async (me, listingId) => {
    const form = new FormData();
    form.append('photos', new Blob([png(++seq)], { type: 'image/png' }), `drill-${seq}.png`);
    const r = await send('photos', me, 'POST', `/api/listings/${listingId}/photos`, form, 201);
    if (!r) return;
    for (const p of r.json.data) {
      stats.photos.acked += 1;
      ack.photos.push({ id: p.id, listingId, url: p.url });
    }
  };

  const writeMessage = async (me, own) => {
    const body = `${TAG} message ${++seq}`;
    const mine = threadsOfSeller.get(own.seller.email) ?? [];
    if (
      mine.length &&
      Math.random() < 0.3 &&
      (sentBy.get(own.seller.email) ?? 0) < MESSAGE_BUDGET
    ) {
      // The seller answers a buyer.
      sentBy.set(own.seller.email, (sentBy.get(own.seller.email) ?? 0) + 1);
      const r = await send(
        'messages',
        own.seller,
        'POST',
        `/api/threads/${pick(mine)}/messages`,
        { body },
        201,
      );
      if (r) {
        stats.messages.acked += 1;
        ack.messages.push(body);
      }
      return;
    }
    const listing = pick(activeListings.filter((l) => l.seller !== me.email));
    if (!listing || (sentBy.get(me.email) ?? 0) >= MESSAGE_BUDGET) return writePost(me);
    sentBy.set(me.email, (sentBy.get(me.email) ?? 0) + 1);
    // Opens the buyer's conversation about the listing, or adds to it when it is open already.
    const r = await send(
      'messages',
      me,
      'POST',
      '/api/threads',
      { listingId: listing.id, body },
      201,
    );
    if (!r) return;
    stats.messages.acked += 1;
    ack.messages.push(body);
    const ids = threadsOfSeller.get(listing.seller) ?? [];
    if (!ids.includes(r.json.data.id)) ids.push(r.json.data.id);
    threadsOfSeller.set(listing.seller, ids);
  };

  /** Starts (or resumes) the payer's dues checkout and pays it at the stand-in; its webhook comes back by itself. */
  const checkout = async (me) => {
    let open = checkoutOf.get(me.email);
    if (!open) {
      const r = await send('checkouts', me, 'POST', '/api/dues/checkout', {}, 201);
      if (!r) return false;
      // A second start before paying must give the same checkout back (one open checkout per period).
      const again = await send('checkouts', me, 'POST', '/api/dues/checkout', {}, 201);
      open = {
        ...r.json.data,
        reused: again ? again.json.data.sessionId === r.json.data.sessionId : null,
      };
      checkoutOf.set(me.email, open);
    }
    if (open.paid) return false;
    stats.checkouts.requests += 1;
    try {
      const paid = await fetch(open.url, {
        method: 'POST',
        redirect: 'manual',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: new URLSearchParams({
          card_number: '4242 4242 4242 4242',
          expiry: '12 / 40',
          cvc: '123',
        }),
      });
      if (paid.status !== 303) {
        errors.push({
          at: Date.now() - t0,
          status: paid.status,
          what: 'POST payment page',
          kind: 'checkouts',
          unexpected: true,
        });
        return false;
      }
    } catch (err) {
      errors.push({
        at: Date.now() - t0,
        status: 'network',
        what: `payment page ${err.message}`,
        kind: 'checkouts',
        unexpected: true,
      });
      return false;
    }
    open.paid = true;
    stats.checkouts.acked += 1;
    ack.checkouts.push({
      sessionId: open.sessionId,
      email: me.email,
      reused: open.reused,
      at: Date.now() - t0,
    });
    return true;
  };

  const read = async (me) => {
    const listing = pick(activeListings);
    const choice = Math.random();
    if (choice < 0.35) await send('reads', me, 'GET', '/api/posts', undefined, 200);
    else if (choice < 0.6) await send('reads', me, 'GET', '/api/listings?q=drill', undefined, 200);
    else if (choice < 0.75 && listing)
      await send('reads', me, 'GET', `/api/listings/${listing.id}`, undefined, 200);
    else if (choice < 0.9) await send('reads', me, 'GET', '/api/threads', undefined, 200);
    else await send('reads', me, 'GET', '/api/dues/me', undefined, 200);
    stats.reads.acked += 1;
  };

  const worker = async (w) => {
    const own = {
      seller: sellers[w],
      writers: writers.slice(w * WRITERS_PER_WORKER, (w + 1) * WRITERS_PER_WORKER),
      payers: payers.slice(w * PAYERS_PER_WORKER, (w + 1) * PAYERS_PER_WORKER),
    };
    // Spread the checkouts over the run, so some meet the stopped node and process.
    const nextPayAt = () =>
      Date.now() - t0 + (DURATION_MS / (PAYERS_PER_WORKER + 1)) * (0.5 + Math.random());
    let payAt = nextPayAt() / 2;
    while (Date.now() - t0 < DURATION_MS) {
      const x = Math.random();
      const unpaid = own.payers.filter((p) => !checkoutOf.get(p.email)?.paid);
      if (unpaid.length && Date.now() - t0 >= payAt) {
        if (await checkout(unpaid[0])) payAt = nextPayAt();
      } else if (x < 0.55) await read(pick([own.seller, ...own.writers, ...own.payers]));
      else if (x < 0.7) await writePost(pick(own.writers));
      else if (x < 0.8) await writeListing(own.seller);
      else await writeMessage(pick(own.writers), own);
    }
  };

  const chaos = (async () => {
    await sleep(STOP_AT);
    events.push({ at: Date.now() - t0, what: 'stop Galera node1 and API process api1' });
    await Promise.all([stopNode(ports.nodes[0]), stopDetached('api1')]);
    events.push({ at: Date.now() - t0, what: 'node1 and api1 stopped' });
    await sleep(Math.max(0, BACK_AT - (Date.now() - t0)));
    events.push({ at: Date.now() - t0, what: 'start node1 and api1' });
    await startNode(ports, ports.nodes[0]);
    events.push({ at: Date.now() - t0, what: `node1 ${wsrepState(node1)}` });
    await startApi(ports, 0);
    events.push({ at: Date.now() - t0, what: 'api1 answering' });
  })();

  console.log(`[drill] load for ${DURATION_MS / 1000} s ...`);
  await Promise.all([...Array.from({ length: WORKERS }, (_, w) => worker(w)), chaos]);
  const loadEnd = Date.now() - t0;

  // Every paid checkout's webhook delivered (the stand-in retries while the API answers 503), then each event sent
  // once more, as a provider may: the second delivery must change nothing.
  const completedEvents = async () => {
    const res = await fetch(`${PAY}/__fake/events?type=checkout.session.completed`);
    return (await res.json()).data;
  };
  const paidIds = new Set(ack.checkouts.map((c) => c.sessionId));
  const waitDelivered = async (label, min = 1) => {
    for (let i = 0; i < 120; i += 1) {
      const mine = (await completedEvents()).filter((e) => paidIds.has(e.data.object.id));
      if (
        mine.length === paidIds.size &&
        mine.every((e) => e.delivery?.status === 'delivered' && e.delivery.attempts >= min)
      )
        return mine;
      await sleep(500);
    }
    throw new Error(`webhooks not all delivered (${label})`);
  };
  const delivered = await waitDelivered('first');
  const attempts = delivered.map((e) => e.delivery.attempts);
  for (const e of delivered) await fetch(`${PAY}/__fake/events/${e.id}/resend`, { method: 'POST' });
  const resent = await waitDelivered('resend');
  for (const [i, e] of resent.entries())
    if (e.delivery.attempts <= attempts[i]) throw new Error('resend not delivered');
  const eventOf = new Map(resent.map((e) => [e.data.object.id, e.id]));
  events.push({
    at: Date.now() - t0,
    what: `all ${paidIds.size} checkout webhooks delivered, then each sent again`,
  });

  // Every acknowledged photo can be fetched through HAProxy (stored in the bucket, not only in a row).
  let photosMissing = 0;
  for (const p of ack.photos) {
    const r = await fetch(new URL(p.url, BASE)).catch(() => null);
    if (!r || r.status !== 200) photosMissing += 1;
    await r?.arrayBuffer().catch(() => undefined);
  }

  // The confirmation page each payer sees.
  let confirmed = 0;
  for (const c of ack.checkouts) {
    const r = await sessions.get(c.email).call('GET', `/api/dues/checkout/${c.sessionId}`);
    if (r.status === 200 && r.json.data.status === 'succeeded') confirmed += 1;
  }

  // Count every acknowledged write on every node.
  const inList = (values) => values.map(q).join(',') || "''";
  const counted = (cfg, query) => new Map(rows(cfg, query).map(([k, c]) => [k, Number(c)]));
  const tally = (acked, stored) => ({
    acked: acked.length,
    stored: [...stored.values()].reduce((a, b) => a + b, 0),
    lost: acked.filter((k) => !stored.has(String(k))).length,
    dup: [...stored.values()].filter((c) => c > 1).length,
  });
  const payerEmails = members.filter((m) => m.kind === 'payer').map((m) => m.email);
  const perNode = ports.nodes.map((n) => {
    const cfg = nodeCfg(n);
    const posts = counted(
      cfg,
      `SELECT title, COUNT(*) FROM posts WHERE title LIKE ${q(`${TAG} post %`)} GROUP BY title`,
    );
    const listings = counted(
      cfg,
      `SELECT title, COUNT(*) FROM listings WHERE title LIKE ${q(`${TAG} listing %`)} GROUP BY title`,
    );
    const photos = counted(
      cfg,
      `SELECT id, COUNT(*) FROM listing_photos WHERE id IN (${inList(ack.photos.map((p) => p.id))}) GROUP BY id`,
    );
    const messages = counted(
      cfg,
      `SELECT body, COUNT(*) FROM listing_messages WHERE body LIKE ${q(`${TAG} message %`)} GROUP BY body`,
    );
    // Payments: each paid checkout is one succeeded row, its event is recorded once, the member's dues cover the
    // period and one receipt is queued; no payer has a second credited (or held) payment.
    const paidSessions = counted(
      cfg,
      `SELECT provider_session_id, COUNT(*) FROM payments WHERE provider_session_id IN (${inList([...paidIds])}) AND status = 'succeeded' GROUP BY provider_session_id`,
    );
    const perPayer = rows(
      cfg,
      `SELECT u.email, SUM(p.status = 'succeeded'), SUM(p.status = 'held'), MAX(m.paid_through IS NOT NULL AND m.paid_through >= p.covers_to)
      FROM users u JOIN payments p ON p.user_id = u.id JOIN memberships m ON m.user_id = u.id
      WHERE u.email IN (${inList(payerEmails)}) GROUP BY u.email`,
    );
    const eventRows = counted(
      cfg,
      `SELECT event_id, COUNT(*) FROM provider_events WHERE event_id IN (${inList([...eventOf.values()])}) GROUP BY event_id`,
    );
    const receipts = counted(
      cfg,
      `SELECT to_address, COUNT(*) FROM outbox_emails WHERE kind = 'dues-receipt' AND to_address IN (${inList(payerEmails)}) GROUP BY to_address`,
    );
    const paidEmails = ack.checkouts.map((c) => c.email);
    const creditedTwice = perPayer.filter(([, s, h]) => Number(s) > 1 || Number(h) > 0).length;
    const notCovered = paidEmails.filter(
      (e) => !perPayer.some(([pe, , , ok]) => pe === e && ok === '1'),
    ).length;
    return {
      name: n.name,
      state: wsrepState(cfg),
      size: nodeStatus(cfg, 'wsrep_cluster_size'),
      kinds: {
        posts: tally(ack.posts, posts),
        listings: tally(
          ack.listings.map((l) => l.title),
          listings,
        ),
        photos: tally(
          ack.photos.map((p) => p.id),
          photos,
        ),
        messages: tally(ack.messages, messages),
        checkouts: tally([...paidIds], paidSessions),
      },
      payments: {
        creditedTwice,
        notCovered,
        events: tally([...eventOf.values()], eventRows),
        receipts: tally(paidEmails, receipts),
      },
    };
  });

  // Checksums of the touched tables, equal on every node (retried while the last commits are applied).
  const TABLES = [
    'users',
    'user_roles',
    'memberships',
    'posts',
    'listings',
    'listing_photos',
    'listing_threads',
    'listing_messages',
    'payments',
    'provider_events',
  ];
  let sums = [];
  for (let i = 0; i < 20; i += 1) {
    sums = ports.nodes.map((n) =>
      rows(nodeCfg(n), `CHECKSUM TABLE ${TABLES.join(', ')}`)
        .map((r) => r[1])
        .join('/'),
    );
    if (new Set(sums).size === 1) break;
    await sleep(500);
  }
  const stopAt = events[0]?.at ?? STOP_AT;
  const backAt = events.find((e) => e.what.startsWith('start'))?.at ?? BACK_AT;
  const inWindow = (e) =>
    (e.at >= stopAt && e.at <= stopAt + RETRY_WINDOW_MS) ||
    (e.at >= backAt && e.at <= backAt + RETRY_WINDOW_MS);
  // A 500 is a bug wherever it happens; a 502/503/504 or a cut connection is allowed inside the retry window.
  const bad = errors.filter((e) => e.unexpected || e.status === 500 || !inWindow(e));
  const nodeOk = (n) =>
    n.state === 'Synced' &&
    Object.values(n.kinds).every((k) => k.lost === 0 && k.dup === 0) &&
    n.payments.creditedTwice === 0 &&
    n.payments.notCovered === 0 &&
    n.payments.events.lost === 0 &&
    n.payments.events.dup === 0 &&
    n.payments.receipts.lost === 0 &&
    n.payments.receipts.dup === 0;
  const reusedOk = ack.checkouts.every((c) => c.reused !== false);
  const pass =
    perNode.every(nodeOk) &&
    new Set(sums).size === 1 &&
    bad.length === 0 &&
    photosMissing === 0 &&
    confirmed === ack.checkouts.length &&
    ack.checkouts.length > 0 &&
    reusedOk;

  const fmt4xx = (m) =>
    Object.entries(m)
      .map(([s, c]) => `${c}× ${s}`)
      .join(', ') || '0';
  const lines = [
    '# Cluster drill: last result',
    '',
    `Run ${new Date().toISOString()} by \`npm run drill:cluster\` on ${cpus().length} cores: ${WORKERS} concurrent clients for ${DURATION_MS / 1000} s through HAProxy (${BASE}), as ${members.length} drill members made for the run (${WORKERS} sellers, ${writers.length} buyers, ${payers.length} members owing dues).`,
    "The mix: about 55 % reads (post list, listing search and pages, inbox, dues), 15 % new draft posts, 10 % new published listings each with a photo uploaded as multipart (a generated PNG, stored in the S3 stand-in), 20 % messages (a buyer writes to a seller about a listing, the seller answers in the thread), and one dues checkout per owing member, spread over the run: the member starts it through the API (twice; the second start must return the same checkout), the drill pays it on the payment stand-in's page, and the signed webhook comes back through HAProxy. After the load every webhook is sent once more.",
    `Galera node1 (the node HAProxy sends SQL to) and API process api1 are stopped at about ${STOP_AT / 1000} s and started again at about ${BACK_AT / 1000} s. Errors are timed when the answer arrives. Allowed: 502/503/504 or a cut connection within ${RETRY_WINDOW_MS / 1000} s after a stop or a start (the retry window). Never allowed: a 500, an unexpected 4xx (429 from the message limit excepted), or any error outside the window.`,
    '',
    `**Result: ${pass ? 'PASS' : 'FAIL'}**`,
    '',
    '| kind | requests | acknowledged | refused (4xx) | 5xx / cut |',
    '| --- | --- | --- | --- | --- |',
    ...KINDS.map(
      (k) =>
        `| ${k === 'checkouts' ? 'checkouts (start ×2 + pay)' : k} | ${stats[k].requests} | ${stats[k].acked} | ${fmt4xx(stats[k].rejected4xx)} | ${stats[k].errors} |`,
    ),
    '',
    `Errors: ${errors.length} in all, ${bad.length} not allowed. Load ended at ${loadEnd} ms.`,
    '',
    'Acknowledged writes found on each node (lost = acknowledged but missing, duplicated = stored more than once):',
    '',
    '| node | state | size | posts | listings | photos | messages | paid checkouts credited | webhook events recorded | receipts | members credited twice | paid but not covered |',
    '| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |',
    ...perNode.map((n) => {
      const c = (t) =>
        `${t.stored}/${t.acked}${t.lost ? `, ${t.lost} lost` : ''}${t.dup ? `, ${t.dup} dup` : ''}`;
      return `| ${n.name} | ${n.state} | ${n.size} | ${c(n.kinds.posts)} | ${c(n.kinds.listings)} | ${c(n.kinds.photos)} | ${c(n.kinds.messages)} | ${c(n.kinds.checkouts)} | ${c(n.payments.events)} | ${c(n.payments.receipts)} | ${n.payments.creditedTwice} | ${n.payments.notCovered} |`;
    }),
    '',
    `Cells read stored/acknowledged. A stored count above the acknowledged one is a write that landed although its answer was an error (the commit went through, then the reply or the read that builds the answer was cut off by the stopping node); the writer sees the 503 and may send again. Checkouts paid while node1 or api1 was down: ${ack.checkouts.filter((c) => c.at >= stopAt && c.at <= (events.find((e) => e.what === 'api1 answering')?.at ?? backAt)).length}. Photos fetched back through HAProxy: ${ack.photos.length - photosMissing}/${ack.photos.length}. Checkout pages showing "succeeded" to the member: ${confirmed}/${ack.checkouts.length}; second start returned the same checkout: ${ack.checkouts.filter((c) => c.reused).length}/${ack.checkouts.length}. Webhook delivery attempts before the resend: ${attempts.length ? `${Math.min(...attempts)}–${Math.max(...attempts)}` : 'none'}.`,
    '',
    `CHECKSUM TABLE (${TABLES.join(', ')}) per node:`,
    '',
    ...ports.nodes.map((n, i) => `- ${n.name}: ${sums[i]}`),
    `- ${new Set(sums).size === 1 ? 'equal on all nodes' : 'NOT equal'}`,
    '',
    'Timeline (ms from the start of the load):',
    '',
    ...events.map((e) => `- ${e.at}: ${e.what}`),
    ...(errors.length
      ? [
          '',
          'Errors:',
          '',
          ...errors
            .slice(0, 40)
            .map(
              (e) =>
                `- ${e.at}: ${e.status}${e.code ? ` ${e.code}` : ''} ${e.what}${bad.includes(e) ? ' (not allowed)' : ''}`,
            ),
        ]
      : []),
    '',
  ];
  writeFileSync(join(ROOT, 'docs', 'cluster-drill.md'), lines.join('\n'));
  console.log(lines.join('\n'));
  process.exit(pass ? 0 : 1);
}

main().catch((err) => {
  console.error(`[drill] ${err instanceof Error ? err.stack : String(err)}`);
  process.exit(1);
});
