const dateTimeFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });
const dateFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium' });

function parse(timestamp: string): Date | null {
  const date = new Date(timestamp);
  return Number.isNaN(date.getTime()) ? null : date;
}

/** "2 Dec 2026, 10:15" for a server timestamp; the raw text when it is not a date. */
export function formatDateTime(timestamp: string): string {
  const date = parse(timestamp);
  return date ? dateTimeFormat.format(date) : timestamp;
}

/** "2 Dec 2026" for a server timestamp; the raw text when it is not a date. */
export function formatDate(timestamp: string): string {
  const date = parse(timestamp);
  return date ? dateFormat.format(date) : timestamp;
}

/** True when `timestamp` lies before `now`; false for text that is not a date. */
export function isPast(timestamp: string, now: Date = new Date()): boolean {
  const date = parse(timestamp);
  return date !== null && date.getTime() < now.getTime();
}
