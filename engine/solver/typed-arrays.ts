/**
 * Typed arrays filled from a list. `Float64Array.from(list, fn)` goes through the
 * iterator protocol and costs microseconds per call, which adds up over the dozens of
 * small arrays every partition builds at the start of a run.
 */
export function floats<T>(list: ArrayLike<T>, fn: (item: T, index: number) => number): Float64Array {
  const out = new Float64Array(list.length);
  for (let i = 0; i < list.length; i += 1) out[i] = fn(list[i]!, i);
  return out;
}

export function ints<T>(list: ArrayLike<T>, fn: (item: T, index: number) => number): Int32Array {
  const out = new Int32Array(list.length);
  for (let i = 0; i < list.length; i += 1) out[i] = fn(list[i]!, i);
  return out;
}

export function flags<T>(list: ArrayLike<T>, fn: (item: T, index: number) => boolean): Uint8Array {
  const out = new Uint8Array(list.length);
  for (let i = 0; i < list.length; i += 1) out[i] = fn(list[i]!, i) ? 1 : 0;
  return out;
}
