import type { ReactNode } from 'react';

/** A row of tabs over a panel; the caller shows the panel of the tab picked. */
export function TabList<T extends string>({
  tabs,
  current,
  onPick,
  label,
  testIdPrefix,
  className = '',
}: {
  tabs: ReadonlyArray<{ id: T; label: ReactNode }>;
  current: T;
  onPick: (id: T) => void;
  label: string;
  testIdPrefix: string;
  className?: string;
}) {
  return (
    <div role="tablist" aria-label={label} className={`flex gap-1 overflow-x-auto border-b border-rule ${className}`}>
      {tabs.map((t) => (
        <button
          key={t.id}
          type="button"
          role="tab"
          aria-selected={current === t.id}
          onClick={() => onPick(t.id)}
          className={`-mb-px whitespace-nowrap border-b-2 px-2 py-1.5 text-sm ${current === t.id ? 'border-accent font-medium text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
          data-testid={`${testIdPrefix}-${t.id}`}
        >
          {t.label}
        </button>
      ))}
    </div>
  );
}
