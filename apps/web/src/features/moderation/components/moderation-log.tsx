import { formatDateTime } from '@app/shared/locale';
import type { AuditEntryDto } from '@app/shared';
import { ScrollRegion } from '../../../components/ui/scroll-region';

const WORDS: Record<string, string> = {
  'post.approve': 'approved a post',
  'post.reject': 'rejected a post',
  'post.request-changes': 'asked for changes to a post',
  'post.self-publish': 'published their own post',
  'post.self-edit': 'edited their own published post',
  'post.pin': 'pinned a post',
  'post.unpin': 'unpinned a post',
  'post.lock': 'locked a post',
  'post.unlock': 'unlocked a post',
  'post.hide': 'hid a post',
  'post.unhide': 'unhid a post',
  'post.accept-answer': 'accepted an answer',
  'comment.approve': 'approved a comment',
  'comment.reject': 'rejected a comment',
  'comment.self-publish': 'published their own comment',
  'report.dismiss': 'dismissed a report',
  'report.hide-post': 'hid a reported post',
  'report.hide-comment': 'hid a reported comment',
};

const titleOf = (details: unknown) =>
  typeof details === 'object' &&
  details !== null &&
  'title' in details &&
  typeof details.title === 'string'
    ? details.title
    : '';

/** The moderation log: who did what, when and why. */
export function ModerationLog({ entries }: { entries: AuditEntryDto[] }) {
  if (entries.length === 0) return <p>No moderator actions yet.</p>;
  return (
    <ScrollRegion label="Moderator actions">
      <table className="w-full border-collapse text-left text-sm">
        <thead>
          <tr className="border-b-2 border-ink-800">
            <th scope="col" className="p-2">
              When
            </th>
            <th scope="col" className="p-2">
              Who
            </th>
            <th scope="col" className="p-2">
              What
            </th>
            <th scope="col" className="p-2">
              Why
            </th>
          </tr>
        </thead>
        <tbody>
          {entries.map((e) => (
            <tr key={e.id} className="border-b border-sand-500 align-top">
              <td className="p-2 whitespace-nowrap">{formatDateTime(e.createdAt)}</td>
              <td className="p-2">{e.actor?.displayName ?? 'system'}</td>
              <td className="p-2">
                {WORDS[e.action] ?? e.action}{' '}
                {titleOf(e.details) && <em>“{titleOf(e.details)}”</em>}{' '}
                <span className="text-ink-600">
                  ({e.subjectType} {e.subjectId})
                </span>
              </td>
              <td className="p-2">{e.reason ?? '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
