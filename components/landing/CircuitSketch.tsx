/**
 * A decorative sketch for the landing page: a double-acting cylinder driven by a
 * solenoid 5/2 valve, with the pressurised line drawn in the accent colour.
 */
export function CircuitSketch({ className }: { className?: string }) {
  return (
    <svg
      viewBox="0 0 260 176"
      aria-hidden="true"
      focusable="false"
      className={className}
      fill="none"
      stroke="currentColor"
      strokeWidth="1.5"
      strokeLinejoin="round"
      strokeLinecap="round"
    >
      <g className="text-ink">
        <rect x="30" y="24" width="130" height="34" />
        <path d="M78 24v34" strokeWidth="3" />
        <path d="M78 41h146" />
        <path d="M224 31v20" strokeWidth="3" />

        <rect x="80" y="104" width="40" height="30" />
        <rect x="120" y="104" width="40" height="30" />
        <path d="M100 134 90 104M86 107l4-3 1.5 4.5" />
        <path d="M110 104l4 30M110.5 130l3.5 4 2.5-4.5" />
        <path d="M140 134l10-30M146.5 106.5l3.5-2.5 1 4.5" />
        <path d="M130 104l-4 30M123.5 129.5l2.5 4.5 3.5-4" />

        <rect x="60" y="109" width="20" height="20" />
        <path d="M60 129l20-20" />
        <path d="M160 119l4-6 4 12 4-12 4 12 4-6" />

        <circle cx="100" cy="160" r="7" />
        <path d="M97 162.5 100 156.5l3 6Z" fill="currentColor" />
      </g>

      <path d="M44 58v24h46v22" className="text-accent" strokeWidth="2.5" />
      <path d="M100 134v19" className="text-accent" strokeWidth="2.5" />
      <path d="M146 58v24h-36v22" className="text-ink-faint" strokeDasharray="4 3" />

      <g className="font-mono text-ink-soft" fill="currentColor" stroke="none" fontSize="10">
        <text x="30" y="16">1A1</text>
        <text x="186" y="134">1V1</text>
        <text x="56" y="146">1M1</text>
        <text x="112" y="163">6 bar</text>
      </g>
    </svg>
  );
}
