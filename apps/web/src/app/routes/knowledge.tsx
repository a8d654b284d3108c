import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { useMyPosts, usePosts } from '@/features/knowledge/api/get-posts';
import { useTopics } from '@/features/knowledge/api/get-topics';
import { useSearchPosts } from '@/features/knowledge/api/search-posts';
import { PostCard } from '@/features/knowledge/components/post-card';
import { errorMessage } from '@/lib/form-errors';

/** The club's knowledge: search, topics, published posts, and the member's own posts. */
export function KnowledgeRoute() {
  const { user } = useCurrentUser();
  const [params, setParams] = useSearchParams();
  const topic = params.get('topic') ?? undefined;
  const q = params.get('q') ?? '';
  const [typed, setTyped] = useState(q);
  const topics = useTopics();
  const posts = usePosts({ topic, page: 1 });
  const hits = useSearchPosts(q, topic);
  const mine = useMyPosts(!!user);
  const setParam = (key: string, value: string | undefined) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next);
  };
  return (
    <Page
      title="Knowledge"
      intro={
        <p>
          What held in a blow, where rode chafed through, how a snubber was rigged: the club’s
          experience, checked by its moderators.
        </p>
      }
    >
      <div className="flex flex-wrap items-end gap-3">
        <form
          role="search"
          className="flex flex-1 flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            setParam('q', typed.trim() || undefined);
          }}
        >
          <label className="flex min-w-0 flex-1 flex-col gap-1 text-sm font-bold">
            Search posts
            <input
              type="search"
              value={typed}
              onChange={(e) => setTyped(e.target.value)}
              maxLength={200}
              className="min-h-11 rounded-md border border-sand-500 bg-sand-50 px-3 font-normal"
            />
          </label>
          <button
            type="submit"
            className="min-h-11 rounded-md bg-ink-800 px-4 font-bold text-sand-50"
          >
            Search
          </button>
        </form>
        {user && (
          <Link
            to={paths.postNew.href()}
            className="inline-flex min-h-11 items-center rounded-md bg-signal-600 px-4 font-bold text-white"
          >
            Write a post
          </Link>
        )}
      </div>
      <nav aria-label="Topics" className="flex flex-wrap gap-2">
        <button
          type="button"
          onClick={() => setParam('topic', undefined)}
          aria-pressed={!topic}
          className="rounded-pill border border-sand-500 px-3 py-1 text-sm aria-pressed:bg-ink-800 aria-pressed:text-sand-50"
        >
          All topics
        </button>
        {topics.data
          ?.filter((t) => !t.retired || t.postCount > 0 || topic === t.slug)
          .map((t) => (
            <button
              key={t.id}
              type="button"
              onClick={() => setParam('topic', t.slug)}
              aria-pressed={topic === t.slug}
              className="rounded-pill border border-sand-500 px-3 py-1 text-sm aria-pressed:bg-ink-800 aria-pressed:text-sand-50"
            >
              {t.name} ({t.postCount})
            </button>
          ))}
      </nav>
      {q ? (
        <section aria-labelledby="results-title" className="flex flex-col gap-3">
          <h2 id="results-title" className="text-xl">
            Results for “{q}”
          </h2>
          {hits.isPending && <Spinner label="Searching…" />}
          {hits.isError && (
            <Alert tone="error">
              <p>{errorMessage(hits.error)}</p>
            </Alert>
          )}
          {hits.data?.length === 0 && <p>No posts match. Try fewer or different words.</p>}
          <ul className="flex flex-col gap-3">
            {hits.data?.map((h) => (
              <PostCard
                key={h.post.id}
                post={h.post}
                href={paths.post.href(h.post.id)}
                title={h.title}
                snippet={h.snippet}
              />
            ))}
          </ul>
        </section>
      ) : (
        <section aria-label="Published posts" className="flex flex-col gap-3">
          {posts.isPending && <Spinner label="Loading posts…" />}
          {posts.isError && (
            <Alert tone="error">
              <p>{errorMessage(posts.error)}</p>
            </Alert>
          )}
          {posts.data?.length === 0 && <p>No posts here yet.</p>}
          <ul className="flex flex-col gap-3">
            {posts.data?.map((p) => (
              <PostCard key={p.id} post={p} href={paths.post.href(p.id)} />
            ))}
          </ul>
        </section>
      )}
      {user && (mine.data?.length ?? 0) > 0 && (
        <section aria-labelledby="mine-title" className="flex flex-col gap-3">
          <h2 id="mine-title" className="text-xl">
            Your posts
          </h2>
          <ul className="flex flex-col gap-3">
            {mine.data?.map((p) => (
              <PostCard key={p.id} post={p} href={paths.post.href(p.id)} showStatus />
            ))}
          </ul>
        </section>
      )}
    </Page>
  );
}
