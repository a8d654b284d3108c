import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import type { User } from '../../models';
import { Post } from '../../models';
import { seedTopics } from './testing/knowledge-fixtures';
import { createTestApp, resetDb } from '../../testing/test-app';
import { highlight, resetPostIndex, searchPosts, snippet } from './post-index';
import { buildPost, buildUser } from '../../testing/builders';

const built = createTestApp();
afterAll(() => built.close());

/** A fixed corpus: title, body text, topic index (0 anchoring, 1 rode and chain, 2 snubbers, 3 storm). */
const CORPUS: Array<[title: string, text: string, topic: number]> = [
  [
    'Setting a plow anchor in soft mud',
    'Back down slowly and let the plow bury before loading it.',
    0,
  ],
  [
    'Claw or scoop for weed?',
    'Weed clogs the tip; a scoop with a roll-bar reset better for us.',
    0,
  ],
  [
    'Grade 43 chain after eight seasons',
    'The galvanising wore at the links that sit on the roller.',
    1,
  ],
  [
    'Splicing three-strand nylon to chain',
    'A rope-to-chain splice runs over the gypsy; seize it well.',
    1,
  ],
  [
    'A bridle for the catamaran',
    'Two legs from the bows meet at a chain hook; chafe guards on both.',
    2,
  ],
  ['Snubber length that worked', 'Seven metres of 14 mm nylon took the snatch out of the rode.', 2],
  [
    'Doubling lines before a gale',
    'Storm preparation: double every line, add chafe gear, strip the sails.',
    3,
  ],
  [
    'Hurricane hole checklist',
    'Storm anchors out, two rodes, chafe gear, and leave the boat early.',
    3,
  ],
];

let ids: number[] = [];
beforeEach(async () => {
  await resetDb();
  resetPostIndex();
  const topics = await seedTopics();
  const author: User = await buildUser();
  ids = [];
  for (const [title, text, t] of CORPUS) {
    const p = await buildPost(author, { topicId: topics[t]?.id ?? null, title, bodyText: text });
    ids.push(p.id);
  }
});

const top = async (q: string, n = 1) =>
  (await searchPosts(q, { signedIn: false }))
    .slice(0, n)
    .map((r) => CORPUS[ids.indexOf(Number(r.id))]?.[0]);

describe('post search relevance on a fixed corpus', () => {
  it.each([
    ['snubber', ['Snubber length that worked']],
    ['snuber', ['Snubber length that worked']], // misspelt: fuzzy
    ['splice', ['Splicing three-strand nylon to chain']],
    ['splic', ['Splicing three-strand nylon to chain']], // prefix
    ['hurricane', ['Hurricane hole checklist']],
    ['bridle catamaran', ['A bridle for the catamaran']],
    ['plow mud', ['Setting a plow anchor in soft mud']],
    ['galvanizing', ['Grade 43 chain after eight seasons']], // US spelling of a UK word: fuzzy
  ])('%s → %j first', async (q, expected) => {
    expect(await top(q)).toEqual(expected);
  });

  it('ranks both storm posts (topic match) above the rest for "storm"', async () => {
    expect(new Set(await top('storm', 2))).toEqual(
      new Set(['Doubling lines before a gale', 'Hurricane hole checklist']),
    );
  });

  it('finds nothing for a word in no post, and hides members-only posts from visitors', async () => {
    expect(await searchPosts('windvane', { signedIn: false })).toEqual([]);
    await Post.update({ visibility: 'members' }, { where: { id: ids[5] } });
    resetPostIndex();
    expect(await top('snubber')).not.toContain('Snubber length that worked');
    expect((await searchPosts('snubber', { signedIn: true }))[0]?.id).toBe(ids[5]);
  });
});

describe('highlight and snippet', () => {
  it('marks the matched words only', () => {
    expect(highlight('Snubber length, snubber hook', ['snubber'])).toEqual([
      { text: 'Snubber', match: true },
      { text: ' length, ', match: false },
      { text: 'snubber', match: true },
      { text: ' hook', match: false },
    ]);
  });
  it('cuts around the first match', () => {
    const text = `${'word '.repeat(200)}chafe ${'tail '.repeat(100)}`;
    const pieces = snippet(text, ['chafe'], 60);
    expect(pieces[0]?.text).toBe('… ');
    expect(pieces.some((p) => p.match && p.text === 'chafe')).toBe(true);
    expect(pieces.map((p) => p.text).join('').length).toBeLessThan(70);
  });
});
