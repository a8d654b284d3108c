/** Asks the moderator for a reason; null when cancelled or too short. */
export function askReason(question: string): string | null {
  const reason = window.prompt(question);
  if (reason === null) return null;
  return reason.trim().length >= 3 ? reason.trim() : null;
}
