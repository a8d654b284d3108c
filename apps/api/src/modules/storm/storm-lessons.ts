import { Op } from 'sequelize';
import { createPostSchema } from '@app/shared';
import { invalid } from '../../errors/app-error';
import { Topic, type StormWatch, type User } from '../../models';
import { createPost } from '../posts/posts.service';

/** A Tiptap document of the lessons note: one paragraph per paragraph of the note. */
function lessonsDoc(watch: StormWatch, lessons: string) {
  const paragraphs = lessons
    .split(/\n\s*\n/)
    .map((p) => p.trim())
    .filter(Boolean);
  const intro = `${watch.name}: ${watch.sustainedKn} kn sustained, gusting ${watch.gustKn} kn (club storm watch).`;
  return {
    type: 'doc',
    content: [intro, ...paragraphs].map((text) => ({
      type: 'paragraph',
      content: [{ type: 'text', text }],
    })),
  };
}

/**
 * Starts a draft article from a watch's lessons note, through the posts module, in the storm-preparation topic
 * (or the first open topic). The moderator edits and publishes it like any other draft.
 */
export async function lessonsPost(actor: User, watch: StormWatch, lessons: string) {
  const topic =
    (await Topic.findOne({ where: { slug: 'storm-preparation', retiredAt: null } })) ??
    (await Topic.findOne({
      where: { retiredAt: { [Op.is]: null } },
      order: [['position', 'ASC']],
    }));
  if (!topic) throw invalid({ makePost: 'There is no open topic to file the post under' });
  return createPost(
    actor,
    createPostSchema.parse({
      kind: 'article',
      title: `Lessons from ${watch.name}`.slice(0, 160),
      topicId: topic.id,
      body: lessonsDoc(watch, lessons),
      visibility: 'public',
      boatId: null,
      setup: null,
      submit: false,
    }),
  );
}
