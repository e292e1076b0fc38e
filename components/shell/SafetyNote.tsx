type SafetyNoteProps = {
  className?: string;
};

/** The caution that travels with every result that could hurt someone if trusted blindly. */
export function SafetyNote({ className }: SafetyNoteProps) {
  return (
    <p
      className={[
        'flex items-start gap-2 rounded-md border border-caution/40 bg-caution-soft px-3 py-2 text-sm text-ink',
        className,
      ]
        .filter(Boolean)
        .join(' ')}
    >
      <svg
        viewBox="0 0 20 20"
        aria-hidden="true"
        focusable="false"
        className="mt-0.5 size-4 shrink-0 text-caution"
        fill="none"
        stroke="currentColor"
        strokeWidth="1.75"
        strokeLinejoin="round"
      >
        <path d="M10 2.5 18 17H2L10 2.5Z" />
        <path d="M10 8v4M10 14.5v.01" strokeLinecap="round" />
      </svg>
      <span>
        <strong className="font-semibold">Safety:</strong> Airproof&rsquo;s simulations help you
        reason about a circuit; they do not stand in for a risk assessment. Check every design against
        the machinery-safety standards and local codes that apply to it, and have a competent person
        sign it off before anyone relies on it.
      </span>
    </p>
  );
}
