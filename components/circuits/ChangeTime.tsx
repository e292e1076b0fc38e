import { formatAbsoluteTime, formatRelativeTime } from './format-change-time';

/** Relative time for scanning a list, exact time on hover for the record. */
export function ChangeTime({ iso }: { iso: string }) {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return <span className="text-ink-soft">—</span>;

  const absolute = formatAbsoluteTime(date);
  return (
    <time dateTime={iso} title={absolute} className="whitespace-nowrap">
      {formatRelativeTime(date)}
      <span className="sr-only"> ({absolute})</span>
    </time>
  );
}
