/**
 * Mentions in a comment body: `@` at the start of a word, followed by a member's display name
 * with its white space taken out or by the local part of their e-mail address, in any case. The
 * name runs on over letters, digits and . _ ' + - only. Unknown names stay plain text. The rule
 * is written down in README.md.
 */

export interface Mentionable {
  userId: string;
  name: string;
  email: string;
}

// Not after a letter, digit or address character, so that an e-mail address in the text names nobody.
const MENTION = /(?<![\p{L}\p{M}\p{N}._%+-])@([\p{L}\p{M}\p{N}._'’+-]+)/gu;
// A mention at the end of a sentence or in quotes carries the punctuation after it.
const TRAILING = /[._'’+-]+$/u;
const POSSESSIVE = /['’]s$/u;

function fold(text: string): string {
  return text.normalize('NFC').toLowerCase();
}

function handlesOf(member: Mentionable): string[] {
  return [fold(member.name.replace(/\s+/gu, '')), fold(member.email.split('@')[0] ?? '')].filter(Boolean);
}

/** The members a body mentions, each once, in member order. */
export function mentionedMembers<M extends Mentionable>(body: string, members: readonly M[]): M[] {
  const written = new Set<string>();
  for (const match of body.matchAll(MENTION)) {
    const word = match[1]!;
    written.add(fold(word));
    written.add(fold(word.replace(TRAILING, '')));
    written.add(fold(word.replace(POSSESSIVE, '')));
  }
  return members.filter((member) => handlesOf(member).some((handle) => written.has(handle)));
}
