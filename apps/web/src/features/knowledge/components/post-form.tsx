import { formatTime } from '@app/shared/locale';
import type { CreatePostInput, PostDetailDto, TopicDto } from '@app/shared';
import type { JSONContent } from '@tiptap/react';
import { Suspense, useEffect, useId, useRef, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/lib/api-client';
import { errorMessage } from '@/lib/form-errors';
import { useSavePost } from '../api/save-post';
import { SetupFields } from './setup-fields';
import { EMPTY_SETUP, fromSetup, toSetupInput, type SetupValues } from './setup-values';
import { lazyNamed } from '@/lib/lazy-named';
import { loadFormSchemas, preloadFormSchemas } from '@/lib/lazy-schema';

// The editor (Tiptap and ProseMirror, about 135 KB) is its own chunk: the form paints with its other fields while
// it loads, and its box keeps the editor's height meanwhile.
const RichTextEditor = lazyNamed(() => import('./rich-text-editor'), 'RichTextEditor');

function EditorLoading() {
  return (
    <div className="flex min-h-60 items-center justify-center rounded-md border border-sand-500 bg-white text-sm text-ink-600">
      Loading the editor…
    </div>
  );
}

preloadFormSchemas();

export interface PostFormProps {
  post: PostDetailDto | null;
  topics: TopicDto[];
  boats: Array<{ id: number; name: string }>;
  onSubmitted: (post: PostDetailDto) => void;
}

const AUTOSAVE_MS = 2500;

/** Writes or edits a post: title, kind, topic, body, optional setup; drafts save themselves as you type. */
export function PostForm({ post, topics: allTopics, boats, onSubmitted }: PostFormProps) {
  const bodyLabelId = useId();
  // A retired topic is offered only to the post already filed under it.
  const topics = allTopics.filter((t) => !t.retired || t.id === post?.topic?.id);
  const save = useSavePost();
  // An edit waiting for a moderator is what the author goes on editing; readers still see the published post.
  const rev = post?.revision ?? null;
  const published = post?.status === 'approved';
  const [revisionStatus, setRevisionStatus] = useState(rev?.status ?? null);
  const [postId, setPostId] = useState<number | null>(post?.id ?? null);
  const [title, setTitle] = useState(rev?.title ?? post?.title ?? '');
  const [kind, setKind] = useState<'article' | 'question'>(rev?.kind ?? post?.kind ?? 'article');
  const [topicId, setTopicId] = useState<number>(
    rev?.topicId ?? post?.topic?.id ?? topics[0]?.id ?? 0,
  );
  const [visibility, setVisibility] = useState<'public' | 'members'>(
    rev?.visibility ?? post?.visibility ?? 'public',
  );
  const [boatId, setBoatId] = useState<number | null>(rev ? rev.boatId : (post?.boat?.id ?? null));
  const [body, setBody] = useState<JSONContent | null>(
    ((rev?.body ?? post?.body) as JSONContent | undefined) ?? null,
  );
  const [hasSetup, setHasSetup] = useState(
    rev ? rev.setup !== null : post?.setupCard !== null && post?.setupCard !== undefined,
  );
  const [setup, setSetup] = useState<SetupValues>(
    rev?.setup
      ? fromSetup(rev.setup)
      : post?.setupCard
        ? fromSetup(post.setupCard.setup)
        : EMPTY_SETUP,
  );
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [savedAt, setSavedAt] = useState<Date | null>(null);
  const dirty = useRef(false);

  const input = (): CreatePostInput => ({
    kind,
    title,
    topicId,
    visibility,
    body: body ?? { type: 'doc', content: [] },
    boatId: kind === 'question' ? boatId : null,
    setup: hasSetup ? toSetupInput(setup) : null,
  });

  const persist = async (submit: boolean) => {
    const value = input();
    const parsed = (await loadFormSchemas()).createPostSchema.safeParse(value);
    if (!parsed.success) {
      const f: Record<string, string> = {};
      for (const i of parsed.error.issues) f[i.path.join('.') || '_'] ??= i.message;
      if (submit) setErrors(f);
      return null;
    }
    try {
      const saved = await save.mutateAsync({
        postId,
        input: { ...value, submit: submit && postId === null },
        submit,
      });
      setPostId(saved.id);
      setRevisionStatus(saved.revision?.status ?? null);
      setSavedAt(new Date());
      setErrors({});
      dirty.current = false;
      return saved;
    } catch (err) {
      setErrors(
        err instanceof ApiError ? { ...err.fields, _: err.message } : { _: errorMessage(err) },
      );
      return null;
    }
  };

  // Autosave: a draft (or an edit) is saved a moment after typing stops.
  const status = post?.status ?? 'draft';
  useEffect(() => {
    if (!dirty.current || status !== 'draft') return;
    const t = setTimeout(() => void persist(false), AUTOSAVE_MS);
    return () => clearTimeout(t);
  });
  const touch =
    <T,>(fn: (v: T) => void) =>
    (v: T) => {
      dirty.current = true;
      fn(v);
    };

  const handleSubmit = async () => {
    const saved = await persist(true);
    if (saved) onSubmitted(saved);
  };

  return (
    <form
      className="flex flex-col gap-4"
      onSubmit={(e) => {
        e.preventDefault();
        void handleSubmit();
      }}
    >
      {post?.moderationNote && (
        <Alert tone="warning" title="A moderator asked for changes">
          <p>{post.moderationNote}</p>
        </Alert>
      )}
      {published && revisionStatus === 'pending' && (
        <Alert tone="info" title="Your edit goes back to moderation">
          <p>
            These changes wait for a moderator. Readers see the published version until the edit is
            approved.
          </p>
        </Alert>
      )}
      {published && !revisionStatus && (
        <p className="text-sm text-ink-600">
          This post is published. A small correction to its text is published straight away; new
          links or images, a setup block, a different topic, boat or visibility, or a larger rewrite
          go back to a moderator first, and readers keep the published version meanwhile.
        </p>
      )}
      <fieldset className="flex flex-wrap gap-4">
        <legend className="sr-only">Kind of post</legend>
        {(['article', 'question'] as const).map((k) => (
          <label key={k} className="flex items-center gap-2">
            <input
              type="radio"
              name="kind"
              checked={kind === k}
              onChange={() => touch(setKind)(k)}
            />
            {k === 'article' ? 'Article (a setup or a lesson)' : 'Question'}
          </label>
        ))}
      </fieldset>
      <TextField
        label="Title"
        value={title}
        onChange={(e) => touch(setTitle)(e.target.value)}
        error={errors.title}
        required
        maxLength={160}
      />
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="flex flex-col gap-1 text-sm font-bold">
          Topic
          <select
            value={topicId}
            onChange={(e) => touch(setTopicId)(Number(e.target.value))}
            className="min-h-11 rounded-md border border-sand-500 bg-sand-50 px-2 font-normal"
          >
            {topics.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-bold">
          Who can read it
          <select
            value={visibility}
            onChange={(e) => touch(setVisibility)(e.target.value as 'public' | 'members')}
            className="min-h-11 rounded-md border border-sand-500 bg-sand-50 px-2 font-normal"
          >
            <option value="public">Everyone</option>
            <option value="members">Members only</option>
          </select>
          {errors.visibility && <span className="text-flare-700">{errors.visibility}</span>}
        </label>
        {kind === 'question' && boats.length > 0 && (
          <label className="flex flex-col gap-1 text-sm font-bold">
            Attach one of your boats
            <select
              value={boatId ?? ''}
              onChange={(e) => touch(setBoatId)(e.target.value ? Number(e.target.value) : null)}
              className="min-h-11 rounded-md border border-sand-500 bg-sand-50 px-2 font-normal"
            >
              <option value="">No boat</option>
              {boats.map((b) => (
                <option key={b.id} value={b.id}>
                  {b.name}
                </option>
              ))}
            </select>
          </label>
        )}
      </div>
      <div className="flex flex-col gap-1">
        <span id={bodyLabelId} className="text-sm font-bold">
          Post
        </span>
        <Suspense fallback={<EditorLoading />}>
          <RichTextEditor labelId={bodyLabelId} initial={body} onChange={touch(setBody)} />
        </Suspense>
        {errors.body && (
          <p role="alert" className="text-sm font-bold text-flare-700">
            {errors.body}
          </p>
        )}
      </div>
      <label className="flex items-center gap-2">
        <input
          type="checkbox"
          checked={hasSetup}
          onChange={(e) => touch(setHasSetup)(e.target.checked)}
        />
        Add a tackle setup block (figures are computed for you)
      </label>
      {hasSetup && <SetupFields value={setup} onChange={touch(setSetup)} errors={errors} />}
      {errors._ && (
        <Alert tone="error">
          <p>{errors._}</p>
        </Alert>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" isPending={save.isPending}>
          {published ? 'Save the edit' : 'Send to the moderators'}
        </Button>
        <Button variant="secondary" onClick={() => void persist(false)} isPending={save.isPending}>
          Save draft
        </Button>
        <span role="status" className="text-sm text-ink-600">
          {savedAt ? `Saved at ${formatTime(savedAt)}` : ''}
        </span>
      </div>
      <p className="text-xs text-ink-600">
        A moderator reads every new post before it is published. Moderators’ own posts publish
        straight away and are logged.
      </p>
    </form>
  );
}
