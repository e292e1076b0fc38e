/** A count with its noun, in the plural unless it is one: "1 tube", "3 tubes". */
export function countOf(n: number, noun: string): string {
  return `${n} ${noun}${n === 1 ? '' : 's'}`;
}
