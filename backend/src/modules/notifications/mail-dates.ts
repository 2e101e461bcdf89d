/**
 * A moment as the reader reads it: in their own time zone, with the zone named, e.g.
 * "Thu 3 Dec 2026, 14:02 (Europe/Berlin)". Formatting comes from the runtime's Intl (ECMA-402) and its
 * time-zone data, so daylight-saving changes are right without code of ours.
 */
export function formatInZone(moment: Date, timeZone: string): string {
  const text = new Intl.DateTimeFormat('en-GB', {
    timeZone,
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }).format(moment);
  return `${text} (${timeZone})`;
}
