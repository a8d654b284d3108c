import type { AuditEntryDto } from '@app/shared';

/** What each logged action reads as. Older rows keep their older action names, so both are here. */
const WORDS: Record<string, string> = {
  'post.publish': 'published a post',
  'post.send-back': 'sent a post back to its author',
  'post.decline': 'declined a post',
  'post.revision-publish': 'published an edit of a post',
  'post.revision-send-back': 'sent an edit back to its author',
  'post.revision-decline': 'declined an edit of a post',
  'post.approve': 'published a post',
  'post.reject': 'declined a post',
  'post.request-changes': 'sent a post back to its author',
  'post.revision-approve': 'published an edit of a post',
  'post.revision-reject': 'declined an edit of a post',
  'post.revision-request-changes': 'sent an edit back to its author',
  'post.self-publish': 'published their own post',
  'post.self-edit': 'edited their own published post',
  'post.pin': 'pinned a post',
  'post.unpin': 'unpinned a post',
  'post.lock': 'locked a post',
  'post.unlock': 'unlocked a post',
  'post.hide': 'hid a post',
  'post.unhide': 'unhid a post',
  'post.accept-answer': 'accepted an answer',
  'comment.publish': 'published a comment',
  'comment.decline': 'declined a comment',
  'comment.approve': 'published a comment',
  'comment.reject': 'declined a comment',
  'comment.self-publish': 'published their own comment',
  'report.dismiss': 'dismissed a report',
  'report.hide-post': 'hid a reported post',
  'report.hide-comment': 'hid a reported comment',
  'listing.hide': 'hid a listing',
  'listing.unhide': 'showed a hidden listing again',
  'listing-report.dismiss': 'dismissed a listing report',
};

export const stringIn = (details: unknown, key: string) =>
  typeof details === 'object' &&
  details !== null &&
  key in details &&
  typeof (details as Record<string, unknown>)[key] === 'string'
    ? ((details as Record<string, unknown>)[key] as string)
    : '';

/** "published a post", or for an undo "undid: published a post". */
export function actionWords(e: Pick<AuditEntryDto, 'action' | 'details'>): string {
  if (e.action === 'decision.undo') {
    const undid = stringIn(e.details, 'undid');
    return `undid: ${WORDS[undid] ?? (undid || 'a decision')}`;
  }
  return WORDS[e.action] ?? e.action;
}
