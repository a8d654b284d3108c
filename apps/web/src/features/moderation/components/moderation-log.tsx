import { formatDateTime } from '@app/shared/locale';
import type { AuditEntryDto } from '@app/shared';

import { actionWords, stringIn } from './moderation-log-words';

function What({ e }: { e: AuditEntryDto }) {
  const title = stringIn(e.details, 'title');
  return (
    <>
      {actionWords(e)} {title && <em>“{title}”</em>}{' '}
      <span className="text-ink-600">
        ({e.subjectType} {e.subjectId})
      </span>
    </>
  );
}

/**
 * The moderation log: who did what, when and why. A table from `md` up; below it one card per entry, so on a
 * phone what happened and why read without scrolling sideways.
 */
export function ModerationLog({ entries }: { entries: AuditEntryDto[] }) {
  if (entries.length === 0) return <p>No moderator actions yet.</p>;
  return (
    <>
      <ul aria-label="Moderator actions" className="flex flex-col gap-2 md:hidden">
        {entries.map((e) => (
          <li
            key={e.id}
            className="flex min-w-0 flex-col gap-1 rounded-md border border-sand-500 bg-sand-50 p-3 text-sm"
          >
            <p className="text-xs text-ink-600">
              {formatDateTime(e.createdAt)} · {e.actor?.displayName ?? 'system'}
            </p>
            <p className="break-words">
              <What e={e} />
            </p>
            <p className="break-words">
              <strong>Why:</strong> {e.reason ?? '—'}
            </p>
          </li>
        ))}
      </ul>
      <table className="hidden w-full border-collapse text-left text-sm md:table">
        <caption className="sr-only">Moderator actions</caption>
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
                <What e={e} />
              </td>
              <td className="p-2 break-words">{e.reason ?? '—'}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}
