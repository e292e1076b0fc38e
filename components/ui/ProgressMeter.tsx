import type { ReactNode } from 'react';

/** A bar filled to done of total (an estimate may be passed: the bar never overfills), with what it counts under it. */
export function ProgressMeter({ done, total, label, children, testId }: { done: number; total: number; label: string; children: ReactNode; testId: string }) {
  const share = total > 0 ? Math.min(1, done / total) : 0;
  return (
    <div className="space-y-1" data-testid={testId}>
      <div className="h-2 overflow-hidden rounded bg-paper-sunk" role="progressbar" aria-valuemin={0} aria-valuemax={total} aria-valuenow={Math.min(done, total)} aria-label={label}>
        <div className="h-full bg-accent" style={{ width: `${(share * 100).toFixed(1)}%` }} />
      </div>
      <p className="value text-xs text-ink-soft">{children}</p>
    </div>
  );
}
