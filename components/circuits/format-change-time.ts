const relativeSteps: ReadonlyArray<{ unit: Intl.RelativeTimeFormatUnit; seconds: number }> = [
  { unit: 'year', seconds: 365 * 24 * 3600 },
  { unit: 'month', seconds: 30 * 24 * 3600 },
  { unit: 'week', seconds: 7 * 24 * 3600 },
  { unit: 'day', seconds: 24 * 3600 },
  { unit: 'hour', seconds: 3600 },
  { unit: 'minute', seconds: 60 },
];

const relativeFormat = new Intl.RelativeTimeFormat('en', { numeric: 'auto' });
const absoluteFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

/** "3 hours ago", "yesterday"; anything under a minute reads as "just now". */
export function formatRelativeTime(date: Date, now: Date = new Date()): string {
  const elapsedSeconds = (date.getTime() - now.getTime()) / 1000;
  for (const { unit, seconds } of relativeSteps) {
    if (Math.abs(elapsedSeconds) >= seconds) {
      return relativeFormat.format(Math.round(elapsedSeconds / seconds), unit);
    }
  }
  return 'just now';
}

export function formatAbsoluteTime(date: Date): string {
  return absoluteFormat.format(date);
}
