/** The next time (server local time) at or after `from` that the clock shows HH:MM. */
export function nextOccurrence(time: string, from: Date): Date {
  const [hours, minutes] = time.split(':').map(Number);
  const next = new Date(from);
  next.setHours(hours, minutes, 0, 0);
  if (next.getTime() <= from.getTime()) next.setDate(next.getDate() + 1);
  return next;
}

/** The latest scheduled time at or before `at`. */
export function previousOccurrence(time: string, at: Date): Date {
  const next = nextOccurrence(time, at);
  const previous = new Date(next);
  previous.setDate(previous.getDate() - 1);
  return previous;
}

/** A run was missed when a scheduled time passed after the last start (and the server was not running it). */
export function wasMissed(time: string, lastStartedAt: Date | null, now: Date): boolean {
  if (!lastStartedAt) return false;
  return previousOccurrence(time, now).getTime() > lastStartedAt.getTime();
}
