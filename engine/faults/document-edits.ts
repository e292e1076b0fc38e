import { componentTypeById } from '../components/registry';
import { parameterDefaults } from '../components/types';
import type { CircuitComponent, CircuitDocument } from '../document/schema';

/** A component's parameter as it runs: the drawing's value, else its type's default. */
export function parameterValue(component: CircuitComponent, name: string): number | string | boolean | undefined {
  if (name in component.parameters) return component.parameters[name];
  const type = componentTypeById(component.type);
  return type ? parameterDefaults(type)[name] : undefined;
}

export function numberParameter(component: CircuitComponent, name: string): number {
  const value = parameterValue(component, name);
  if (typeof value !== 'number') throw new Error(`${component.tag} has no number parameter "${name}"`);
  return value;
}

/** Whether a component's type has a parameter of that name. */
export function hasParameter(component: CircuitComponent, name: string): boolean {
  return componentTypeById(component.type)?.parameters[name] !== undefined;
}

/**
 * A copy of the document with some parameters of one component replaced. Numbers are held to
 * the parameter's allowed range, so a faulted drawing still compiles.
 */
export function withParameters(document: CircuitDocument, component: CircuitComponent, values: Record<string, number | string | boolean>): CircuitDocument {
  const specs = componentTypeById(component.type)?.parameters ?? {};
  const held = Object.fromEntries(
    Object.entries(values).map(([name, value]) => {
      const spec = specs[name];
      return [name, spec?.kind === 'number' && typeof value === 'number' ? Math.min(Math.max(value, spec.min), spec.max) : value];
    }),
  );
  return {
    ...document,
    components: document.components.map((c) => (c.id === component.id ? { ...c, parameters: { ...c.parameters, ...held } } : c)),
  };
}

/** Two significant figures, without trailing zeros. */
const short = (x: number) => Number(x.toPrecision(2)).toString();

/** Text forms in the units the pages use (bar gauge, mm, ms, %, l/(s·bar) for conductance). */
export const text = {
  barGauge: (pa: number) => `${(pa / 100_000).toFixed(2)} bar gauge`,
  mm: (m: number) => `${(m * 1000).toFixed(1)} mm`,
  ms: (s: number) => `${Math.round(s * 1000)} ms`,
  percent: (fraction: number) => `${Math.round(fraction * 100)} %`,
  // 1 m³/(s·Pa) = 1e8 l/(s·bar): 1000 l per m³ times 1e5 Pa per bar.
  conductance: (c: number) => `C = ${short(c * 1e8)} l/(s·bar)`,
};
