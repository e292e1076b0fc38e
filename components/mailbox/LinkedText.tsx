import { splitLinks } from './split-links';

/** Plain text with its web addresses made clickable. */
export function LinkedText({ text }: { text: string }) {
  return (
    <>
      {splitLinks(text).map((piece, index) =>
        piece.kind === 'link' ? (
          <a
            key={index}
            href={piece.href}
            rel="noreferrer"
            className="break-all font-medium text-accent-strong underline underline-offset-2 hover:text-ink"
          >
            {piece.href}
          </a>
        ) : (
          <span key={index}>{piece.text}</span>
        ),
      )}
    </>
  );
}
