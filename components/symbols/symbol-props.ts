/** Props every symbol drawing takes. */
export interface SymbolProps {
  /** Designation drawn small beside the symbol (1V1, 1S1, K1). */
  tag?: string;
  /** Port and terminal numbers beside each anchor; on unless turned off. */
  showPortNumbers?: boolean;
}

/** What a placed component shows beyond its type: its tag, and during a run its state. */
export interface ShownState extends SymbolProps {
  /** A state name of the type: a valve's position, a switch worked or not, a logic valve's joined input. */
  state?: string;
  /** A coil or lamp carrying current. */
  energised?: boolean;
  /** A valve's position by index; wins over `state`. */
  activePosition?: number;
  /** A cylinder's piston travel as a share of its stroke, 0 (retracted) to 1, for drawing a run. */
  extension?: number;
}

/** A load that carries current (a coil, a lit lamp) is filled faintly in the current colour. */
export function energisedFill(energised: boolean): { fill: string; fillOpacity?: number } {
  return energised ? { fill: 'currentColor', fillOpacity: 0.25 } : { fill: 'none' };
}
