import { componentTypeById } from '../components/registry';
import type { CircuitComponent } from '../document/schema';

/** Directional control valves are the types that declare switching positions (timers included). */
export const directionalValve = (component: CircuitComponent): boolean => componentTypeById(component.type)?.positions !== undefined;
