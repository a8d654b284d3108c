/** Web and mail addresses only, as the server allows; an empty answer removes the link. */
export function linkProblem(href: string): string | null {
  if (href === '') return null;
  if (/^mailto:[^\s@]+@[^\s@]+$/i.test(href)) return null;
  try {
    const url = new URL(href);
    return url.protocol === 'https:' || url.protocol === 'http:'
      ? null
      : 'Use a web address (https://…) or mailto:';
  } catch {
    return 'That is not a full address: start it with https://';
  }
}
