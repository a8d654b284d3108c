import type { PostDecision } from '@app/shared';
import type { ReasonQuestion } from './reason-dialog';

/** Rodewise's words for a decision on a waiting post: the button, what the card says after, the question. */
export const POST_DECISION_WORDS: Record<
  PostDecision,
  { button: string; done: string; ask?: (title: string) => ReasonQuestion }
> = {
  publish: { button: 'Publish', done: 'Published' },
  'send-back': {
    button: 'Send back…',
    done: 'Sent back to the author',
    ask: (title) => ({
      title: `Send “${title}” back to the author?`,
      hint: 'What should change before it is published? The author reads this note and keeps their text.',
      label: 'Note to the author',
      confirmLabel: 'Send back',
    }),
  },
  decline: {
    button: 'Decline…',
    done: 'Declined',
    ask: (title) => ({
      title: `Decline “${title}”?`,
      hint: 'Why is it not published? The author reads this and keeps their text.',
      confirmLabel: 'Decline post',
      isDestructive: true,
    }),
  },
};
