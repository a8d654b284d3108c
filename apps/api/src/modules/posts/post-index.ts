import MiniSearch, { type SearchResult } from 'minisearch';
import { Op, type WhereOptions } from 'sequelize';
import type { HighlightPiece, PostSetup } from '@app/shared';
import { Post, Topic } from '../../models';

interface IndexedPost {
  id: number;
  title: string;
  text: string;
  topic: string;
  setup: string;
  visibility: string;
  topicSlug: string;
}

/** Searchable words of a setup: anchor type, chain grade, rode material and the connectors' names. */
export function setupWords(setup: PostSetup | null): string {
  if (!setup) return '';
  const c = setup.components;
  return [
    setup.boat.label,
    setup.boat.hull,
    c.anchor ? `${c.anchor.type} anchor` : '',
    c.chain ? `${c.chain.grade} chain` : '',
    c.rode ? `${c.rode.material} ${c.rode.construction} rode` : '',
    c.snubber ? `${c.snubber.material} snubber` : '',
    ...c.connectors.map((k) => `${k.label} ${k.kind}`),
    setup.bottom ?? '',
  ]
    .filter(Boolean)
    .join(' ');
}

const newIndex = () =>
  new MiniSearch<IndexedPost>({
    fields: ['title', 'text', 'topic', 'setup'],
    storeFields: ['visibility', 'topicSlug'],
    searchOptions: { boost: { title: 3, topic: 2, setup: 1.5 }, fuzzy: 0.2, prefix: true },
  });

let index = newIndex();
let built: Promise<void> | null = null;
let watermark = new Date(0);

type PostWithTopic = Post & { topic?: Topic | null };

function toDoc(post: PostWithTopic): IndexedPost {
  return {
    id: post.id,
    title: post.title,
    text: post.bodyText,
    topic: post.topic?.name ?? '',
    setup: setupWords(post.setup),
    visibility: post.visibility,
    topicSlug: post.topic?.slug ?? '',
  };
}

function put(post: PostWithTopic) {
  if (index.has(post.id)) index.discard(post.id);
  if (post.status === 'approved') index.add(toDoc(post));
  if (post.updatedAt > watermark) watermark = post.updatedAt;
}

async function load(where: WhereOptions<Post>) {
  return Post.findAll({ where, include: [{ model: Topic, as: 'topic' }], order: [['id', 'ASC']] });
}

/** Builds the index from MariaDB once per process (later calls wait for the same build). */
export function ensurePostIndex(): Promise<void> {
  built ??= (async () => {
    for (const p of await load({ status: 'approved' })) put(p);
  })().catch((err: unknown) => {
    built = null;
    throw err;
  });
  return built;
}

/** Adds, replaces or drops one post after a write (only approved posts are searchable). */
export async function indexPost(postId: number): Promise<void> {
  if (!built) return;
  await built;
  const [post] = await load({ id: postId });
  if (post) put(post);
  else if (index.has(postId)) index.discard(postId);
}

/** Picks up posts another API process changed since the last one this index saw. */
async function catchUp() {
  for (const p of await load({ updatedAt: { [Op.gt]: watermark } })) put(p);
}

/** Forgets everything (tests empty the tables under it). */
export function resetPostIndex() {
  index = newIndex();
  built = null;
  watermark = new Date(0);
}

export interface PostSearchOptions {
  signedIn: boolean;
  topicSlug?: string | undefined;
  limit?: number;
}

/** Fuzzy + prefix search over title, body text, topic and setup words; members-only posts need a sign-in. */
export async function searchPosts(q: string, opts: PostSearchOptions): Promise<SearchResult[]> {
  await ensurePostIndex();
  await catchUp();
  return index
    .search(q, {
      filter: (r) =>
        (opts.signedIn || r.visibility === 'public') &&
        (!opts.topicSlug || r.topicSlug === opts.topicSlug),
    })
    .slice(0, opts.limit ?? 20);
}

const WORD = /[\p{L}\p{N}]+/gu;

/** Splits `text` into pieces, marking the words that are among `terms` (case-insensitive). */
export function highlight(text: string, terms: readonly string[]): HighlightPiece[] {
  const wanted = new Set(terms.map((t) => t.toLowerCase()));
  const out: HighlightPiece[] = [];
  let last = 0;
  for (const m of text.matchAll(WORD)) {
    if (!wanted.has(m[0].toLowerCase())) continue;
    if (m.index > last) out.push({ text: text.slice(last, m.index), match: false });
    out.push({ text: m[0], match: true });
    last = m.index + m[0].length;
  }
  if (last < text.length) out.push({ text: text.slice(last), match: false });
  return out;
}

/** About `size` characters of `text` around its first matched term, highlighted. */
export function snippet(text: string, terms: readonly string[], size = 220): HighlightPiece[] {
  const flat = text.replace(/\s+/g, ' ');
  const wanted = new Set(terms.map((t) => t.toLowerCase()));
  let at = 0;
  for (const m of flat.matchAll(WORD)) {
    if (wanted.has(m[0].toLowerCase())) {
      at = m.index;
      break;
    }
  }
  const start = Math.max(0, at - Math.floor(size / 3));
  const cut = flat.slice(start, start + size);
  const pieces = highlight(cut, terms);
  if (start > 0) pieces.unshift({ text: '… ', match: false });
  if (start + size < flat.length) pieces.push({ text: ' …', match: false });
  return pieces;
}
