import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { usePosts } from '@/features/knowledge/api/get-posts';
import { HomeCard, HomeEmpty, HomeLoading } from './home-card';
import { countOf } from '@/lib/plural';

export interface PostsCardProps {
  title: string;
  /** `open-questions`: questions without an accepted answer; `recent`: the newest published posts. */
  show: 'open-questions' | 'recent';
}

/** A short list of knowledge posts. */
export function PostsCard({ title, show }: PostsCardProps) {
  const posts = usePosts({ kind: show === 'open-questions' ? 'question' : undefined, page: 1 });
  const list = (posts.data ?? []).filter((p) => show === 'recent' || !p.answered).slice(0, 4);
  return (
    <HomeCard
      title={title}
      more={{ to: paths.knowledge.href(), label: 'Go to the knowledge base' }}
    >
      {posts.isPending && <HomeLoading>Loading posts…</HomeLoading>}
      {posts.isError && <HomeEmpty>The posts could not be loaded.</HomeEmpty>}
      {posts.data && list.length === 0 && (
        <HomeEmpty>
          {show === 'open-questions' ? 'Every question has an answer.' : 'No posts yet.'}
        </HomeEmpty>
      )}
      {list.length > 0 && (
        <ul className="flex flex-col gap-1">
          {list.map((post) => (
            <li key={post.id}>
              <Link to={paths.post.href(post.id)}>{post.title}</Link>{' '}
              <span className="text-ink-600">
                {post.topic ? `· ${post.topic.name} ` : ''}·{' '}
                {countOf(post.commentCount, 'comment', 'comments')}
              </span>
            </li>
          ))}
        </ul>
      )}
    </HomeCard>
  );
}
