export type TextPiece = { kind: 'text'; text: string } | { kind: 'link'; href: string };

const URL_PATTERN = /\bhttps?:\/\/[^\s<>"']+/gi;
// Sentence punctuation right after a URL belongs to the sentence, not the address.
const TRAILING_PUNCTUATION = /[.,;:!?)\]}]+$/;

/**
 * Cuts plain text into text and http(s) links, so links can be rendered as elements and
 * everything else stays text; nothing in the message is ever parsed as HTML.
 */
export function splitLinks(text: string): TextPiece[] {
  const pieces: TextPiece[] = [];
  let from = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const href = match[0].replace(TRAILING_PUNCTUATION, '');
    const start = match.index;
    if (start > from) pieces.push({ kind: 'text', text: text.slice(from, start) });
    pieces.push({ kind: 'link', href });
    from = start + href.length;
  }
  if (from < text.length) pieces.push({ kind: 'text', text: text.slice(from) });
  return pieces;
}
