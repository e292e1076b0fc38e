/**
 * Pressure colours for tubes during a run: a continuous ramp that stays readable with the
 * common colour-vision deficiencies, from dark blue (atmospheric) to yellow (full pressure).
 * Stops sampled along the cividis map (from memory: its published table runs from #00204d to
 * #ffea46 through greys); linear in between.
 */
const STOPS: ReadonlyArray<readonly [number, number, number]> = [
  [0x00, 0x20, 0x4d],
  [0x31, 0x44, 0x6b],
  [0x66, 0x69, 0x70],
  [0x95, 0x8f, 0x78],
  [0xcb, 0xba, 0x69],
  [0xff, 0xea, 0x46],
];

/** Colour for a share 0…1 of the ramp (clamped), as #rrggbb. */
export function rampColour(share: number): string {
  const s = Math.min(1, Math.max(0, Number.isFinite(share) ? share : 0)) * (STOPS.length - 1);
  const i = Math.min(STOPS.length - 2, Math.floor(s));
  const f = s - i;
  const [a, b] = [STOPS[i]!, STOPS[i + 1]!];
  const hex = (k: number) => Math.round(a[k]! + (b[k]! - a[k]!) * f).toString(16).padStart(2, '0');
  return `#${hex(0)}${hex(1)}${hex(2)}`;
}

/** The ramp's top, bar gauge: the highest pressure in the run rounded up to a whole bar, at least 1. */
export function rampTopBar(highestGaugeBar: number): number {
  return Math.max(1, Math.ceil(highestGaugeBar - 1e-9));
}
