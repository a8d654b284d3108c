import '@/testing/setup';
import type { PostDetailDto } from '@app/shared';
import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { buildSession, buildUser } from '@/testing/builders';
import { renderWithProviders } from '@/testing/render';
import { PostForm } from './post-form';

const doc = (text: string) => ({
  type: 'doc',
  content: [{ type: 'paragraph', content: [{ type: 'text', text }] }],
});

const published = (over: Partial<PostDetailDto> = {}): PostDetailDto => ({
  id: 7,
  kind: 'article',
  title: 'Published title',
  excerpt: 'Published text',
  status: 'approved',
  visibility: 'public',
  topic: { id: 1, slug: 'anchoring', name: 'Anchoring' },
  author: { id: 1, displayName: 'Test Sailor' },
  hasSetup: false,
  helpfulCount: 0,
  commentCount: 0,
  answered: false,
  pinned: false,
  locked: false,
  publishedAt: '2026-11-01T10:00:00.000Z',
  updatedAt: '2026-11-02T10:00:00.000Z',
  body: doc('Published text'),
  bodyHtml: '<p>Published text</p>',
  revision: null,
  moderationNote: null,
  boat: null,
  setupCard: null,
  acceptedCommentId: null,
  comments: [],
  viewer: {
    canEdit: true,
    canModerate: false,
    canAccept: false,
    hasVoted: false,
    canComment: true,
  },
  ...over,
});

const topics = [
  {
    id: 1,
    slug: 'anchoring',
    name: 'Anchoring',
    description: '',
    position: 1,
    retired: false,
    postCount: 1,
  },
  { id: 2, slug: 'rode', name: 'Rode', description: '', position: 2, retired: false, postCount: 0 },
];
const session = buildSession(buildUser());

describe('post editor: an edit of a published post goes back to moderation', () => {
  it('opens the waiting edit, not the published version, and says it waits for a moderator', async () => {
    renderWithProviders(
      <PostForm
        post={published({
          revision: {
            status: 'pending',
            kind: 'article',
            title: 'Edited title',
            topicId: 2,
            boatId: null,
            visibility: 'members',
            body: doc('Edited text'),
            bodyHtml: '<p>Edited text</p>',
            setup: null,
          },
        })}
        topics={topics}
        boats={[]}
        onSubmitted={() => undefined}
      />,
      { session },
    );
    expect(await screen.findByText('Your edit goes back to moderation')).toBeInTheDocument();
    expect(screen.getByLabelText(/title/i)).toHaveValue('Edited title');
    expect(screen.getByRole('button', { name: 'Save the edit' })).toBeInTheDocument();
  });

  it('tells the author of a published post which edits need a moderator', async () => {
    renderWithProviders(
      <PostForm post={published()} topics={topics} boats={[]} onSubmitted={() => undefined} />,
      { session },
    );
    expect(await screen.findByText(/go back to a moderator first/)).toBeInTheDocument();
    expect(screen.getByLabelText(/title/i)).toHaveValue('Published title');
    expect(screen.queryByText('Your edit goes back to moderation')).not.toBeInTheDocument();
  });
});

describe('post editor: the rich-text editor loads after the rest of the form', () => {
  it('shows the other fields and a placeholder first, then the editor with the waiting text', async () => {
    renderWithProviders(
      <PostForm post={published()} topics={topics} boats={[]} onSubmitted={() => undefined} />,
      { session },
    );
    expect(screen.getByLabelText(/title/i)).toHaveValue('Published title');
    expect(screen.getByText('Loading the editor…')).toBeInTheDocument();
    const body = await screen.findByRole('textbox', { name: 'Post' });
    expect(body).toHaveTextContent('Published text');
    expect(screen.queryByText('Loading the editor…')).not.toBeInTheDocument();
  });
});
