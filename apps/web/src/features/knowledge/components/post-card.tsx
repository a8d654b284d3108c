import type { HighlightPiece, PostSummaryDto } from '@app/shared';
import { Link } from 'react-router-dom';
import { HighlightText } from './highlight-text';
import { PostStatusBadge } from './post-status-badge';
import { countOf } from '@/lib/plural';

export interface PostCardProps {
  post: PostSummaryDto;
  href: string;
  /** Highlighted title and snippet from a search. */
  title?: HighlightPiece[];
  snippet?: HighlightPiece[];
  showStatus?: boolean;
}

/** One post in a list: kind, title, excerpt and counts. */
export function PostCard({ post, href, title, snippet, showStatus }: PostCardProps) {
  return (
    <li className="flex flex-col gap-1 rounded-md border border-sand-500 bg-sand-50 p-4">
      <p className="flex flex-wrap items-center gap-2 text-xs font-bold tracking-wide text-ink-600 uppercase">
        <span>{post.kind === 'question' ? 'Question' : 'Article'}</span>
        {post.topic && <span>· {post.topic.name}</span>}
        {post.pinned && <span className="text-signal-700">· Pinned</span>}
        {post.answered && <span className="text-kelp-700">· Answered</span>}
        {post.hasSetup && <span>· Tackle setup</span>}
        {showStatus && <PostStatusBadge status={post.status} />}
      </p>
      <h2 className="text-lg">
        <Link to={href} className="underline-offset-2 hover:underline">
          {title ? <HighlightText pieces={title} /> : post.title}
        </Link>
      </h2>
      <p className="text-sm text-ink-700">
        {snippet ? <HighlightText pieces={snippet} /> : post.excerpt}
      </p>
      <p className="text-xs text-ink-600">
        {post.author.displayName} · {post.helpfulCount} found it helpful ·{' '}
        {post.kind === 'question'
          ? countOf(post.commentCount, 'answer', 'answers')
          : countOf(post.commentCount, 'comment', 'comments')}
      </p>
    </li>
  );
}
