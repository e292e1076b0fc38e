import { DirectionalValveSymbol, type DirectionalValveSymbolProps } from './DirectionalValveSymbol';

/**
 * A pressure sequence valve is a 3/2 valve switched by the pressure on its control port
 * against a spring; the adjustable spring sets the switching pressure.
 */
export function PressureSequenceValveSymbol(props: Omit<DirectionalValveSymbolProps, 'adjustableReturn'>) {
  return <DirectionalValveSymbol {...props} adjustableReturn />;
}
