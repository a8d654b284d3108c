import { formatDateTime } from '@app/shared/locale';
import type { ThreadDto } from '@app/shared';
import { cn } from '@/lib/cn';

/** The messages of one conversation, oldest first. */
export function ConversationView({ thread }: { thread: ThreadDto }) {
  return (
    <ol className="flex flex-col gap-2" aria-label="Messages">
      {thread.messages.map((m) => (
        <li
          key={m.id}
          className={cn(
            'max-w-[85%] rounded-lg border p-3 text-sm',
            m.mine
              ? 'self-end border-signal-600 bg-signal-50'
              : 'self-start border-sand-300 bg-sand-50',
          )}
        >
          <p className="text-xs font-bold text-ink-600">
            {m.mine ? 'You' : thread.otherParty.displayName} · {formatDateTime(m.createdAt)}
          </p>
          <p className="whitespace-pre-line">{m.body}</p>
        </li>
      ))}
    </ol>
  );
}
