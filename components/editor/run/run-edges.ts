import type { ConnectionFlowEdge } from '../flow-mapping';
import { rampColour } from './pressure-ramp';
import type { RunFrame } from './run-frame';

/**
 * A tube or wire as a run shows it, in the editor and in a saved run's replay alike: a tube in the
 * colour of its pressure on a ramp topped at `topBar`; a live wire heavy, solid and amber and a
 * dead one thin and dashed, so the two differ without colour.
 */
export function edgeInRun(edge: ConnectionFlowEdge, frame: RunFrame, topBar: number): ConnectionFlowEdge {
  if (edge.data?.kind === 'wire') return { ...edge, className: `${edge.className ?? ''} ${frame.liveWires.has(edge.id) ? 'airproof-wire-live' : 'airproof-wire-dead'}` };
  const bar = frame.tubeBar.get(edge.id);
  return bar === undefined ? edge : { ...edge, style: { stroke: rampColour(bar / topBar), strokeWidth: 3 } };
}
