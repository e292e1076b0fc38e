/** Props every symbol drawing takes. */
export interface SymbolProps {
  /** Designation drawn small beside the symbol (1V1, 1S1, K1). */
  tag?: string;
  /** Port and terminal numbers beside each anchor; on unless turned off. */
  showPortNumbers?: boolean;
}

/** A load that carries current (a coil, a lit lamp) is filled faintly in the current colour. */
export function energisedFill(energised: boolean): { fill: string; fillOpacity?: number } {
  return energised ? { fill: 'currentColor', fillOpacity: 0.25 } : { fill: 'none' };
}
