import { useNavigate, useParams } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Page } from '@/components/ui/page';
import { Spinner } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { usePost } from '@/features/knowledge/api/get-post';
import { useMyBoats } from '@/features/knowledge/api/get-my-boats';
import { useTopics } from '@/features/knowledge/api/get-topics';
import { PostForm } from '@/features/knowledge/components/post-form';
import { errorMessage } from '@/lib/form-errors';

function Editor({ postId }: { postId: number | null }) {
  const navigate = useNavigate();
  const topics = useTopics();
  const boats = useMyBoats(true);
  const post = usePost(postId ?? 0, postId !== null);
  if (topics.isPending || (postId !== null && post.isPending))
    return <Spinner label="Opening the editor…" />;
  if (topics.isError)
    return (
      <Alert tone="error">
        <p>{errorMessage(topics.error)}</p>
      </Alert>
    );
  if (postId !== null && post.isError)
    return (
      <Alert tone="error">
        <p>{errorMessage(post.error)}</p>
      </Alert>
    );
  return (
    <PostForm
      post={postId !== null ? (post.data ?? null) : null}
      topics={topics.data}
      boats={boats.data ?? []}
      onSubmitted={(saved) => void navigate(paths.post.href(saved.id))}
    />
  );
}

/** Write a new post or edit one of yours (its own lazy chunk, so the editor never weighs on other pages). */
export function PostEditRoute() {
  const raw = useParams().postId;
  const postId = raw ? Number(raw) : null;
  return (
    <RequireAuth>
      <Page
        title={postId ? 'Edit post' : 'Write a post'}
        intro={<p>Share a setup, a lesson or a question. Drafts save as you type.</p>}
      >
        <Editor postId={postId} />
      </Page>
    </RequireAuth>
  );
}
