/** Our mark: a two-position valve envelope with air passing one way and held the other. */
export function LogoMark({ className }: { className?: string }) {
  return (
    <svg
      viewBox="0 0 28 28"
      aria-hidden="true"
      focusable="false"
      className={className}
      fill="none"
      stroke="currentColor"
      strokeWidth="2"
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      <rect x="2" y="6" width="24" height="16" rx="3" />
      <path d="M14 6v16" />
      <path d="M8 19V10M5.5 12.5 8 10l2.5 2.5" />
      <path d="M20 19v-5M17.5 14h5" />
      <path d="M1 25.5c2 0 2-1.5 4-1.5s2 1.5 4 1.5" strokeWidth="1.5" />
    </svg>
  );
}
