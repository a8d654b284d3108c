import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HIDDEN_CHARACTERS } from '@app/shared';
import { Comment, MembershipPlan, Report } from '../models';
import { chainListing, exchangeFixture, grantPaidUp } from '../testing/exchange';
import { docOf, seedTopics } from '../modules/posts/testing/knowledge-fixtures';
import { OWASP_XSS_FILTER_EVASION_PAYLOADS } from '../modules/posts/testing/owasp-xss-payloads';
import { resetPostIndex } from '../modules/posts/post-index';
import { buildUser } from '../testing/builders';
import { createTestApp, flushOutbox, inbox, resetDb, type Client } from '../testing/test-app';
import { executableMarkup, visibleText } from './html-check';
import { signedInAs } from '../testing/sign-in';

// OWASP XSS Filter Evasion Cheat Sheet payloads (OWASP Cheat Sheet Series, XSS_Filter_Evasion_Cheat_Sheet.md; the
// list is the fixture modules/posts/testing/owasp-xss-payloads.ts) through every plain-text field the server stores
// and the client shows. Each must come back as the same text, and every piece of HTML the server itself produces
// (rendered post bodies, e-mail HTML) must hold no executable markup when parsed by parse5.
const built = createTestApp({
  LOGIN_RATE_LIMIT: '100000',
  SIGNUP_RATE_LIMIT: '100000',
  PASSWORD_CHANGE_RATE_LIMIT: '100000',
  MESSAGE_RATE_LIMIT: '100000',
});
afterAll(() => built.close());

/** Payloads that fit a field of at most `max` characters (after the trim every text field applies). */
const fitting = (max: number, min = 1) =>
  OWASP_XSS_FILTER_EVASION_PAYLOADS.map((p) => p.trim()).filter(
    (p) => p.length >= min && p.length <= max,
  );

let harborId = 0;
let topicId = 0;
let approvedPostId = 0;
let memberEmail = '';
let member: Client;
let mod: Client;
let admin: Client;
let treasurer: Client;
let planId = 0;

beforeAll(async () => {
  await resetDb();
  resetPostIndex();
  harborId = (await exchangeFixture()).harbors[0]?.id ?? 0;
  topicId = (await seedTopics())[0]?.id ?? 0;
  const m = await signedInAs(built);
  await grantPaidUp(m.user);
  member = m.c;
  memberEmail = m.user.email;
  mod = (await signedInAs(built, ['member', 'moderator'])).c;
  admin = (await signedInAs(built, ['member', 'admin'])).c;
  treasurer = (await signedInAs(built, ['member', 'treasurer'])).c;
  const post = await member.post('/api/posts', {
    kind: 'question',
    title: 'Which snubber length?',
    topicId,
    body: docOf('Which snubber length?', 'Asking for a 10 m sloop.'),
    submit: true,
  });
  approvedPostId = post.body.data.id as number;
  expect(
    (await mod.post(`/api/moderation/posts/${approvedPostId}/decision`, { action: 'approve' }))
      .status,
  ).toBe(200);
  planId = (await MembershipPlan.findOne())?.id ?? 0;
});

type Check = (payload: string) => Promise<string | null>;

/** Runs `check` for every payload and returns the failures (payload → what went wrong). */
async function failuresOf(payloads: string[], check: Check) {
  const out: Record<string, string> = {};
  for (const p of payloads) {
    const problem = await check(p).catch((err: unknown) => String(err));
    if (problem) out[p] = problem;
  }
  return out;
}

const same = (what: string, got: unknown, want: string) =>
  got === want ? null : `${what}: stored ${JSON.stringify(got)}`;

describe('OWASP XSS Filter Evasion Cheat Sheet payloads through plain-text fields', () => {
  it('has the whole list to work with', () => {
    expect(OWASP_XSS_FILTER_EVASION_PAYLOADS.length).toBeGreaterThan(40);
    expect(fitting(80).length).toBeGreaterThan(30);
  });

  it('listing title and description come back as the same text', async () => {
    const fails = await failuresOf(fitting(100, 3), async (p) => {
      const res = await member.post('/api/listings', {
        ...chainListing(harborId),
        title: p,
        description: `${p}\n${p}`,
      });
      if (res.status !== 201) return `create ${res.status}`;
      const got = (await member.get(`/api/listings/${res.body.data.id as number}`)).body.data;
      return same('title', got.title, p) ?? same('description', got.description, `${p}\n${p}`);
    });
    expect(fails).toEqual({});
  });

  it('boat names and tackle plan names and notes come back as the same text', async () => {
    const fails = await failuresOf(fitting(80), async (p) => {
      const boat = { name: p, hull: 'sail', loaM: 9.75, beamM: 3.35, bowHeightM: 1.2 };
      const created = await member.post('/api/boats', boat);
      if (created.status !== 201) return `boat ${created.status}`;
      const boatId = created.body.data.id as number;
      const plan = await member.post('/api/tackle-plans', {
        boatId,
        name: p,
        condition: 'everyday',
        windKn: 30,
        depthM: 6,
        notes: p,
        components: { chain: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 60 } },
      });
      if (plan.status !== 201) return `plan ${plan.status}`;
      const got = (await member.get(`/api/boats/${boatId}`)).body.data;
      const gotPlan = (await member.get(`/api/tackle-plans/${plan.body.data.plan.id as number}`))
        .body.data.plan;
      // Removed again so the member stays under the per-member boat limit.
      await member.delete(`/api/tackle-plans/${plan.body.data.plan.id as number}`);
      await member.delete(`/api/boats/${boatId}`);
      return (
        same('boat name', got.name, p) ??
        same('plan name', gotPlan.name, p) ??
        same('plan notes', gotPlan.notes, p)
      );
    });
    expect(fails).toEqual({});
  });

  it('storm watch names and notes, and readiness help notes, come back as the same text', async () => {
    const boatId = (
      await member.post('/api/boats', {
        name: 'Storm sloop',
        hull: 'sail',
        loaM: 9.75,
        bowHeightM: 1.2,
        homeHarborId: harborId,
      })
    ).body.data.id as number;
    const fails = await failuresOf(fitting(80, 2), async (p) => {
      const opened = await mod.post('/api/storm-watches', {
        name: p,
        sustainedKn: 40,
        gustKn: 55,
        arrivesAt: '2026-12-10T06:00:00Z',
        endsAt: '2026-12-11T06:00:00Z',
        harborIds: [harborId],
        note: p,
      });
      if (opened.status !== 201) return `watch ${opened.status}`;
      const watchId = opened.body.data.id as number;
      const saved = await member.put(`/api/storm-watches/${watchId}/boats/${boatId}`, {
        location: 'marina-berth',
        helpWanted: true,
        helpNote: p,
      });
      if (saved.status !== 200) return `readiness ${saved.status}`;
      const got = (await member.get(`/api/storm-watches/${watchId}`)).body.data.watch;
      const row = (await mod.get(`/api/storm-watches/${watchId}/board`)).body.data.rows[0];
      return (
        same('watch name', got.name, p) ??
        same('watch note', got.note, p) ??
        same('help note', row?.details?.helpNote, p)
      );
    });
    expect(fails).toEqual({});
    // Every watch mailed the members: its name and note are escaped in the mail HTML.
    await flushOutbox();
    const mails = await inbox(memberEmail, 'Storm watch');
    expect(mails.length).toBe(fitting(80, 2).length);
    const bad = mails.flatMap((m) =>
      executableMarkup(m.html ?? '').map((b) => `${m.subject}: ${b}`),
    );
    expect(bad).toEqual([]);
  }, 120_000);

  it('display names come back as the same text', async () => {
    const fails = await failuresOf(fitting(80, 2), async (p) => {
      const res = await member.patch('/api/account', { displayName: p });
      // A payload carrying control or text-direction characters is refused outright, with the field named.
      if (HIDDEN_CHARACTERS.test(p.trim()))
        return res.status === 400 && res.body.error.fields.displayName
          ? null
          : `hidden characters accepted (${res.status})`;
      if (res.status !== 200) return `patch ${res.status}`;
      return same('displayName', (await member.get('/api/auth/me')).body.data.user.displayName, p);
    });
    expect(fails).toEqual({});
  });

  it('post titles come back as the same text, and the rendered body has no executable markup', async () => {
    const fails = await failuresOf(fitting(160, 3), async (p) => {
      const res = await member.post('/api/posts', {
        kind: 'article',
        title: p,
        topicId,
        body: docOf(p, p),
      });
      if (res.status !== 201) return `create ${res.status}`;
      const got = (await member.get(`/api/posts/${res.body.data.id as number}`)).body.data;
      const html = got.bodyHtml as string;
      const bad = executableMarkup(html);
      if (bad.length) return `bodyHtml runs: ${bad.join(', ')}`;
      // The HTML parser drops a NUL from text, as browsers do; everything else must be shown literally.
      if (!visibleText(html).includes(p.replace(/\0/g, '')))
        return `body text lost: ${visibleText(html).slice(0, 80)}`;
      return same('title', got.title, p);
    });
    expect(fails).toEqual({});
  });

  it('comment bodies come back as the same text', async () => {
    const fails = await failuresOf(fitting(5000), async (p) => {
      const res = await member.post(`/api/posts/${approvedPostId}/comments`, { body: p });
      if (res.status !== 201) return `comment ${res.status}`;
      const row = await Comment.findByPk(res.body.data.id as number);
      return same('response body', res.body.data.body, p) ?? same('stored body', row?.body, p);
    });
    expect(fails).toEqual({});
  });

  it('report reasons come back as the same text in the moderation queue', async () => {
    const fails = await failuresOf(fitting(1000, 3), async (p) => {
      const reporter = (await signedInAs(built)).c;
      const res = await reporter.post('/api/reports', {
        targetType: 'post',
        targetId: approvedPostId,
        reason: p,
      });
      if (res.status !== 201) return `report ${res.status}`;
      const queue = (await mod.get('/api/moderation/queue')).body.data.reports as Array<{
        reason: string;
      }>;
      return queue.some((r) => r.reason === p) ? null : 'reason not in the queue as sent';
    });
    expect(fails).toEqual({});
    expect(await Report.count()).toBe(fitting(1000, 3).length);
  });

  it('topic names come back as the same text', async () => {
    // A number in front keeps each name's slug distinct; the payload itself is unchanged.
    const fails = await failuresOf(fitting(54), async (p) => {
      const name = `${fitting(54).indexOf(p)} ${p}`;
      const res = await admin.post('/api/topics', { name });
      if (res.status !== 201) return `topic ${res.status} ${JSON.stringify(res.body.error)}`;
      const topics = (await admin.get('/api/topics')).body.data as Array<{ name: string }>;
      return topics.some((t) => t.name === name) ? null : 'name not listed as sent';
    });
    expect(fails).toEqual({});
  });

  it('offline payment notes come back as the same text', async () => {
    const payer = await buildUser();
    const fails = await failuresOf(fitting(500), async (p) => {
      const res = await treasurer.post('/api/treasury/payments', {
        userId: payer.id,
        planId,
        method: 'cash',
        amountMinor: 100,
        currency: 'EUR',
        receivedOn: '2026-11-30',
        reference: 'Receipt 1',
        note: p,
      });
      if (res.status !== 201) return `payment ${res.status} ${JSON.stringify(res.body.error)}`;
      return same('note', res.body.data.note, p);
    });
    expect(planId).toBeGreaterThan(0);
    expect(fails).toEqual({});
  });
});

describe('OWASP payloads in outgoing e-mail', () => {
  it('thread messages: display name, listing title and message are escaped in the mail HTML', async () => {
    const seller = await signedInAs(built);
    await grantPaidUp(seller.user);
    const fails = await failuresOf(fitting(80, 3), async (p) => {
      const listing = await seller.c.post('/api/listings', {
        ...chainListing(harborId),
        title: p,
        publish: true,
      });
      if (listing.status !== 201) return `listing ${listing.status}`;
      const name = p.replace(new RegExp(HIDDEN_CHARACTERS.source, 'gu'), ' ');
      expect((await member.patch('/api/account', { displayName: name })).status).toBe(200);
      const opened = await member.post('/api/threads', {
        listingId: listing.body.data.id as number,
        body: p,
      });
      if (opened.status !== 201) return `thread ${opened.status}`;
      const thread = (await seller.c.get(`/api/threads/${opened.body.data.id as number}`)).body
        .data as { messages: Array<{ body: string }> };
      const roundTrip = same('message', thread.messages[0]?.body, p);
      if (roundTrip) return roundTrip;
      return null;
    });
    expect(fails).toEqual({});

    await flushOutbox();
    const mails = await inbox(seller.user.email, 'New message about');
    expect(mails.length).toBe(fitting(80, 3).length);
    const mailFails: Record<string, string> = {};
    for (const mail of mails) {
      const html = mail.html ?? '';
      const bad = executableMarkup(html);
      if (bad.length) mailFails[mail.subject] = bad.join(', ');
    }
    expect(mailFails).toEqual({});
    // The payload is shown as text: each appears literally in what the reader sees.
    const shown = mails.map((m) => visibleText(m.html ?? '')).join('\n');
    const missing = fitting(80, 3).filter((p) => !shown.includes(p.replace(/\0/g, '')));
    expect(missing).toEqual([]);
  }, 90_000);

  it('moderation mail: a post title and the moderator’s reason are escaped in the mail HTML', async () => {
    const payloads = fitting(160, 3);
    for (const p of payloads) {
      const post = await member.post('/api/posts', {
        kind: 'article',
        title: p,
        topicId,
        body: docOf('Body', 'Text'),
        submit: true,
      });
      expect(post.status).toBe(201);
      const decided = await mod.post(
        `/api/moderation/posts/${post.body.data.id as number}/decision`,
        {
          action: 'request-changes',
          reason: p.length >= 3 ? p : `${p} please`,
        },
      );
      expect(decided.status).toBe(200);
    }
    await flushOutbox();
    const mails = (await inbox(memberEmail)).filter((m) => m.html && !m.subject.startsWith('New'));
    expect(mails.length).toBeGreaterThanOrEqual(payloads.length);
    const bad = mails.flatMap((m) =>
      executableMarkup(m.html ?? '').map((b) => `${m.subject}: ${b}`),
    );
    expect(bad).toEqual([]);
    const shown = mails.map((m) => visibleText(m.html ?? '')).join('\n');
    expect(payloads.filter((p) => !shown.includes(p.replace(/\0/g, '')))).toEqual([]);
  }, 90_000);
});

describe('the checker itself', () => {
  it('flags the payloads as executable when inserted unescaped, so a pass above means something', () => {
    const flagged = OWASP_XSS_FILTER_EVASION_PAYLOADS.filter((p) => executableMarkup(p).length > 0);
    expect(flagged.length).toBeGreaterThan(25);
    expect(
      executableMarkup('<p style="color:#555"><a href="https://club.example/x">ok</a></p>'),
    ).toEqual([]);
  });
});
