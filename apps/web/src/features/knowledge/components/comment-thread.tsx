import { formatDate } from '@app/shared/locale';
import type { CommentDto, PostDetailDto } from '@app/shared';
import { useState, type FormEvent } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { usePromptDialog } from '@/components/ui/prompt-dialog';
import { errorMessage } from '@/lib/form-errors';
import { useAcceptAnswer, useAddComment, useReport } from '../api/post-actions';

/** A plain-text box for a comment or reply; says when it waits for a moderator. */
function CommentForm({
  postId,
  parentId,
  label,
}: {
  postId: number;
  parentId?: number;
  label: string;
}) {
  const [body, setBody] = useState('');
  const [sent, setSent] = useState(false);
  const add = useAddComment(postId);
  const handleSubmit = (e: FormEvent) => {
    e.preventDefault();
    add.mutate(
      { body, parentId: parentId ?? null },
      {
        onSuccess: () => {
          setBody('');
          setSent(true);
        },
      },
    );
  };
  const id = `comment-${postId}-${parentId ?? 'top'}`;
  return (
    <form onSubmit={handleSubmit} className="flex flex-col gap-2">
      <label htmlFor={id} className="text-sm font-bold">
        {label}
      </label>
      <textarea
        id={id}
        value={body}
        onChange={(e) => setBody(e.target.value)}
        rows={3}
        maxLength={5000}
        required
        className="rounded-md border border-sand-500 bg-sand-50 p-2"
      />
      {add.isError && (
        <p role="alert" className="text-sm font-bold text-flare-700">
          {errorMessage(add.error)}
        </p>
      )}
      {sent && (
        <p role="status" className="text-sm text-ink-700">
          Thanks: it appears once a moderator has looked at it.
        </p>
      )}
      <Button type="submit" size="sm" isPending={add.isPending} className="self-start">
        Send
      </Button>
    </form>
  );
}

function ReportButton({
  targetType,
  targetId,
}: {
  targetType: 'post' | 'comment';
  targetId: number;
}) {
  const report = useReport();
  const { ask, dialog } = usePromptDialog();
  if (report.isSuccess) return <span className="text-xs text-ink-600">Reported</span>;
  const handleClick = async () => {
    const reason = await ask({
      title: `Report this ${targetType}?`,
      label: 'What is wrong with it?',
      hint: 'A moderator reads this.',
      minLength: 3,
      maxLength: 1000,
      confirmLabel: 'Send report',
    });
    if (reason !== null) report.mutate({ targetType, targetId, reason });
  };
  return (
    <>
      <Button
        variant="ghost"
        size="sm"
        onClick={() => void handleClick()}
        isPending={report.isPending}
      >
        Report
      </Button>
      {report.isError && (
        <span role="alert" className="text-xs font-bold text-flare-700">
          {errorMessage(report.error)}
        </span>
      )}
      {dialog}
    </>
  );
}

export { ReportButton };

function CommentItem({
  c,
  post,
  signedIn,
}: {
  c: CommentDto;
  post: PostDetailDto;
  signedIn: boolean;
}) {
  const accept = useAcceptAnswer(post.id);
  const [replying, setReplying] = useState(false);
  return (
    <li
      className={`flex flex-col gap-2 rounded-md border p-3 ${c.accepted ? 'border-l-4 border-ink-800 bg-sand-200' : 'border-sand-500'}`}
    >
      <p className="text-xs text-ink-600">
        <strong>{c.author.displayName}</strong> · {formatDate(c.createdAt)}
        {c.accepted && <strong className="text-ink-900"> · Worked for the asker</strong>}
        {c.status !== 'approved' && (
          <em> · {c.status === 'pending' ? 'waiting for a moderator' : c.status}</em>
        )}
      </p>
      <p className="whitespace-pre-line text-ink-900">{c.body}</p>
      <div className="flex flex-wrap gap-2">
        {post.viewer.canAccept && c.parentId === null && c.status === 'approved' && (
          <Button
            variant="secondary"
            size="sm"
            isPending={accept.isPending}
            onClick={() => accept.mutate(c.accepted ? null : c.id)}
          >
            {c.accepted ? 'Take back “worked for me”' : 'This worked for me'}
          </Button>
        )}
        {post.viewer.canComment && c.parentId === null && (
          <Button variant="ghost" size="sm" onClick={() => setReplying((r) => !r)}>
            Reply
          </Button>
        )}
        {signedIn && <ReportButton targetType="comment" targetId={c.id} />}
      </div>
      {replying && <CommentForm postId={post.id} parentId={c.id} label="Your reply" />}
      {c.replies.length > 0 && (
        <ul className="ml-4 flex flex-col gap-2 border-l-2 border-sand-500 pl-3">
          {c.replies.map((r) => (
            <CommentItem key={r.id} c={r} post={post} signedIn={signedIn} />
          ))}
        </ul>
      )}
    </li>
  );
}

/** Comments (answers for a question), one level of replies, and the form to add one. */
export function CommentThread({ post, signedIn }: { post: PostDetailDto; signedIn: boolean }) {
  const word = post.kind === 'question' ? 'Answers' : 'Comments';
  return (
    <section aria-labelledby="comments-title" className="flex flex-col gap-3">
      <h2 id="comments-title" className="text-xl">
        {word} ({post.commentCount})
      </h2>
      {post.comments.length === 0 && <p className="text-ink-700">None yet.</p>}
      <ul className="flex flex-col gap-3">
        {post.comments.map((c) => (
          <CommentItem key={c.id} c={c} post={post} signedIn={signedIn} />
        ))}
      </ul>
      {post.viewer.canComment && (
        <CommentForm
          postId={post.id}
          label={post.kind === 'question' ? 'Your answer' : 'Your comment'}
        />
      )}
      {post.locked && <Alert tone="info">This post is locked: no new comments.</Alert>}
      {!signedIn && <p className="text-sm text-ink-700">Sign in to comment.</p>}
    </section>
  );
}
