// Moderation vocabulary and the undo window, without the schemas: the web app's first load reads these.
/**
 * A moderator's decision on a waiting post: publish it, send it back to the author with a note, or decline it
 * with a reason. The older action names (approve, request-changes, reject) are still accepted and mean the same.
 */
export const POST_DECISIONS = ['publish', 'send-back', 'decline'] as const;
export type PostDecision = (typeof POST_DECISIONS)[number];

/** How long a moderator's decision can be undone (`POST /api/moderation/decisions/:id/undo`). */
export const UNDO_WINDOW_MS = 10 * 60 * 1000;

export const REPORT_TARGETS = ['post', 'comment'] as const;
