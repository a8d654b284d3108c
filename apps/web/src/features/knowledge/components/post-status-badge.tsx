import type { PostStatus } from '@app/shared';
import { cn } from '@/lib/cn';

const LABELS: Record<PostStatus, string> = {
  draft: 'Draft',
  pending: 'Waiting for a moderator',
  'changes-requested': 'Sent back with a note',
  approved: 'Published',
  rejected: 'Declined',
  hidden: 'Hidden',
};

/** The state of a post in words, coloured by whether it needs the author. */
export function PostStatusBadge({ status }: { status: PostStatus }) {
  return (
    <span
      className={cn(
        'inline-block rounded-pill border px-2 py-0.5 text-xs font-bold',
        status === 'approved' && 'border-kelp-700 text-kelp-700',
        (status === 'rejected' || status === 'changes-requested' || status === 'hidden') &&
          'border-flare-700 text-flare-700',
        (status === 'draft' || status === 'pending') && 'border-ink-600 text-ink-700',
      )}
    >
      {LABELS[status]}
    </span>
  );
}
