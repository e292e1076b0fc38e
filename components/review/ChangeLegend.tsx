/** The key to the marks of a comparison, in the same looks the drawing uses. */
export function ChangeLegend() {
  const badge = (text: string, className: string) => (
    <span className={`inline-flex size-4 items-center justify-center rounded-full text-[10px] font-bold leading-none text-paper-raised ${className}`} aria-hidden="true">
      {text}
    </span>
  );
  return (
    <figure className="flex flex-wrap items-center gap-x-4 gap-y-1 border-t border-rule px-3 py-1 text-xs text-ink-soft" data-testid="change-legend">
      <figcaption className="font-medium text-ink">Since the earlier revision</figcaption>
      <span className="flex items-center gap-1">
        {badge('+', 'bg-accent')} added (solid teal)
      </span>
      <span className="flex items-center gap-1">
        {badge('Δ', 'bg-caution')} changed in what it does (double amber)
      </span>
      <span className="flex items-center gap-1">
        {badge('−', 'bg-ink-soft')} removed (faded, dotted)
      </span>
      <span>Moved or relabelled only: not marked</span>
    </figure>
  );
}
