import { tubeVolume } from '../calc/tube';
import { componentTypeById } from '../components/registry';
import { parameterDefaults, type ActuationLink, type BuildContext, type ComponentType, type NodeRef, type PistonSpec, type RestrictionSpec } from '../components/types';
import type { CircuitDocument } from '../document/schema';
import { ControlCircuit } from './control-network';
import { electricalDiagnostics } from './electrical-diagnostics';
import type { Diagnostic, NodeModel, PistonModel, RestrictionModel, SolverModel } from './model';

/**
 * Volume of a port's own bore and fitting where no tube says otherwise, m³
 * (0.1 cm³; from memory, the order of a push-in fitting on a small valve).
 */
export const PORT_VOLUME_M3 = 1e-7;

export interface CompileResult {
  model: SolverModel | null;
  diagnostics: Diagnostic[];
}

class UnionFind {
  private readonly parent = new Map<string, string>();
  find(a: string): string {
    let root = a;
    while (this.parent.has(root) && this.parent.get(root) !== root) root = this.parent.get(root)!;
    this.parent.set(a, root);
    return root;
  }
  union(a: string, b: string): void {
    const ra = this.find(a);
    const rb = this.find(b);
    if (ra !== rb) this.parent.set(rb < ra ? ra : rb, rb < ra ? rb : ra);
  }
}

const key = (component: string, port: string) => `${component}\u0000${port}`;

/**
 * Turns a circuit document into a solver model. User mistakes become coded
 * diagnostics, never exceptions; the model is null when any is an error.
 */
export function compile(document: CircuitDocument): CompileResult {
  const diagnostics: Diagnostic[] = [];
  const ambientPa = document.settings.ambientPressurePa;
  const temperatureK = document.settings.ambientTemperatureK;
  const types = new Map<string, ComponentType>();
  const seenIds = new Set<string>();
  const tags = new Map<string, string>();

  for (const c of document.components) {
    if (seenIds.has(c.id)) diagnostics.push({ code: 'duplicate-component-id', severity: 'error', message: `Two components share the id ${c.id}`, componentId: c.id });
    seenIds.add(c.id);
    const type = componentTypeById(c.type);
    if (!type) {
      diagnostics.push({ code: 'unknown-component-type', severity: 'error', message: `${c.tag}: unknown component type "${c.type}"`, componentId: c.id });
      continue;
    }
    types.set(c.id, type);
    const other = tags.get(c.tag);
    if (other) diagnostics.push({ code: 'duplicate-tag', severity: 'warning', message: `${c.tag} is used by two components`, componentId: c.id });
    tags.set(c.tag, c.id);
    for (const [name, value] of Object.entries(c.parameters)) {
      const spec = type.parameters[name];
      if (!spec) {
        diagnostics.push({ code: 'unknown-parameter', severity: 'warning', message: `${c.tag}: ${type.label} has no parameter "${name}"`, componentId: c.id });
        continue;
      }
      const bad =
        (spec.kind === 'number' && (typeof value !== 'number' || value < spec.min || value > spec.max)) ||
        (spec.kind === 'choice' && (typeof value !== 'string' || !spec.options.includes(value))) ||
        (spec.kind === 'flag' && typeof value !== 'boolean') ||
        (spec.kind === 'tag' && typeof value !== 'string');
      if (bad) {
        const range = spec.kind === 'number' ? ` (${spec.min} to ${spec.max})` : spec.kind === 'choice' ? ` (one of ${spec.options.join(', ')})` : '';
        diagnostics.push({ code: 'bad-parameter', severity: 'error', message: `${c.tag}: ${spec.label} has an invalid value${range}`, componentId: c.id });
      }
    }
  }

  const byId = new Map(document.components.map((c) => [c.id, c]));
  const uf = new UnionFind();
  const tubeVolumeAt = new Map<string, number>();
  const connectedPorts = new Set<string>();
  const roleOf = (component: string, port: string) => types.get(component)?.ports.find((p) => p.id === port)?.role;
  for (const tube of document.tubes) {
    let ok = true;
    for (const end of [tube.from, tube.to]) {
      const type = types.get(end.component);
      if (!byId.has(end.component) || (type && !type.ports.some((p) => p.id === end.port))) {
        diagnostics.push({ code: 'tube-unknown-port', severity: 'error', message: `Tube ${tube.id} ends at ${end.component}:${end.port}, which does not exist`, tubeId: tube.id });
        ok = false;
      } else if (roleOf(end.component, end.port) === 'terminal') {
        diagnostics.push({ code: 'tube-on-terminal', severity: 'error', message: `Tube ${tube.id} ends at the electrical terminal ${byId.get(end.component)!.tag}:${end.port}`, tubeId: tube.id });
        ok = false;
      }
    }
    if (!ok) continue;
    const a = key(tube.from.component, tube.from.port);
    const b = key(tube.to.component, tube.to.port);
    connectedPorts.add(a);
    connectedPorts.add(b);
    uf.union(a, b);
    tubeVolumeAt.set(a, (tubeVolumeAt.get(a) ?? 0) + tubeVolume(tube.lengthM, tube.innerDiameterM));
  }

  // Wires join electrical terminals into nets, as tubes join ports into nodes.
  const wiring = new UnionFind();
  for (const wire of document.wires) {
    let ok = true;
    for (const end of [wire.from, wire.to]) {
      const role = roleOf(end.component, end.port);
      if (!byId.has(end.component) || (types.has(end.component) && !role)) {
        diagnostics.push({ code: 'wire-unknown-terminal', severity: 'error', message: `Wire ${wire.id} ends at ${end.component}:${end.port}, which does not exist`, wireId: wire.id });
        ok = false;
      } else if (role && role !== 'terminal') {
        diagnostics.push({ code: 'wire-on-air-port', severity: 'error', message: `Wire ${wire.id} ends at the air port ${byId.get(end.component)!.tag}:${end.port}`, wireId: wire.id });
        ok = false;
      }
    }
    if (ok) wiring.union(key(wire.from.component, wire.from.port), key(wire.to.component, wire.to.port));
  }
  const netOfRoot = new Map<string, number>();
  const netOf = (component: string, terminal: string): number => {
    const root = wiring.find(key(component, terminal));
    let net = netOfRoot.get(root);
    if (net === undefined) {
      net = netOfRoot.size;
      netOfRoot.set(root, net);
    }
    return net;
  };
  const control = new ControlCircuit((id) => byId.get(id)?.tag ?? id);
  diagnostics.push(...electricalDiagnostics(document, types, netOf));

  const links = new Map<string, Array<{ from: string; positionM: number }>>();
  for (const link of document.links) {
    if (link.kind !== 'actuation') continue;
    if (!byId.has(link.from) || !byId.has(link.to)) {
      diagnostics.push({ code: 'link-unknown-component', severity: 'error', message: `Link ${link.id} names a component that does not exist` });
      continue;
    }
    links.set(link.to, [...(links.get(link.to) ?? []), { from: link.from, positionM: link.positionM ?? 0 }]);
  }

  if (diagnostics.some((d) => d.severity === 'error')) return { model: null, diagnostics };

  const nodes: NodeModel[] = [];
  const restrictions: RestrictionModel[] = [];
  const pistons: PistonModel[] = [];
  const nodeOfRoot = new Map<string, number>();
  const portNodes: SolverModel['portNodes'] = [];
  const atmosphere = addNode(nodes, { name: 'atmosphere', volumeM3: 0, fixed: true, fixedPressurePa: ambientPa, chambers: [] });
  const pistonOf = new Map<string, number>();
  const registeredPorts = new Set<string>();

  // Pistons first, so links can refer to them whatever the document order.
  const ordered = [...document.components].sort((x, y) => rank(types.get(x.id)) - rank(types.get(y.id)));
  const behaviours: SolverModel['behaviours'] = [];

  for (const component of ordered) {
    const type = types.get(component.id)!;
    const params = { ...parameterDefaults(type), ...component.parameters };
    const portNode = (portId: string): NodeRef => {
      const k = key(component.id, portId);
      const root = uf.find(k);
      let node = nodeOfRoot.get(root);
      if (node === undefined) {
        const spec = type.ports.find((p) => p.id === portId);
        // An exhaust port with nothing fitted vents straight to atmosphere.
        const openExhaust = spec?.role === 'exhaust' && !connectedPorts.has(k);
        node = openExhaust ? atmosphere : addNode(nodes, { name: `${component.tag}:${portId}`, volumeM3: 0, fixed: false, fixedPressurePa: 0, chambers: [] });
        nodeOfRoot.set(root, node);
      }
      if (node !== atmosphere && !registeredPorts.has(k)) {
        registeredPorts.add(k);
        nodes[node]!.volumeM3 += PORT_VOLUME_M3 + (tubeVolumeAt.get(k) ?? 0);
        portNodes.push({ signal: `${component.id}:p:${portId}`, node });
      }
      return { node };
    };
    for (const p of type.ports) {
      if ((p.role === 'working' || p.role === 'supply') && !connectedPorts.has(key(component.id, p.id)) && type.category !== 'measurement') {
        diagnostics.push({ code: 'unconnected-port', severity: 'warning', message: `${component.tag}: port ${p.label ?? p.id} is not connected and is treated as plugged`, componentId: component.id });
      }
    }
    const ctx: BuildContext = {
      componentId: component.id,
      tag: component.tag,
      parameters: params,
      num: (n) => Number(params[n]),
      choice: (n) => String(params[n]),
      flag: (n) => Boolean(params[n]),
      port: portNode,
      terminal: (id) => netOf(component.id, id),
      control: () => control,
      connected: (id) => connectedPorts.has(key(component.id, id)),
      internalNode: (name, volumeM3) => ({ node: addNode(nodes, { name: `${component.tag}:${name}`, volumeM3, fixed: false, fixedPressurePa: 0, chambers: [] }) }),
      atmosphere: () => ({ node: atmosphere }),
      fixedPressure: (name, pressurePa) => ({ node: addNode(nodes, { name: `${component.tag}:${name}`, volumeM3: 0, fixed: true, fixedPressurePa: pressurePa, chambers: [], holder: component.id }) }),
      holdPort: (id, pressurePa) => {
        const ref = portNode(id);
        const node = nodes[ref.node]!;
        if (node.fixed && node.fixedPressurePa !== pressurePa) {
          diagnostics.push({ code: 'supplies-in-conflict', severity: 'warning', message: `${component.tag}: joined to another source at a different pressure`, componentId: component.id });
        }
        node.fixed = true;
        node.fixedPressurePa = pressurePa;
        node.holder = component.id;
        return ref;
      },
      addVolume: (ref, v) => {
        nodes[ref.node]!.volumeM3 += v;
      },
      // Every field named, in one order, rather than spread from the component's spec: records of
      // one shape keep the solver's reads of them monomorphic (spread copies of specs written by
      // different component types had more shapes than V8 reads fast, and its reads went generic).
      restriction: (spec: RestrictionSpec) => {
        restrictions.push({
          name: spec.name,
          owner: component.id,
          from: spec.from.node,
          to: spec.to.node,
          conductance: spec.conductance,
          criticalRatio: spec.criticalRatio,
          oneWay: spec.oneWay,
          crackingPa: spec.crackingPa,
          opening: spec.opening ?? 1,
          modulator: spec.modulator ? { control: spec.modulator.control.node, fn: spec.modulator.fn } : undefined,
        });
        return { restriction: restrictions.length - 1 };
      },
      piston: (spec: PistonSpec) => {
        pistons.push({
          name: spec.name,
          owner: component.id,
          capNode: spec.capNode.node,
          capArea: spec.capArea,
          rodNode: spec.rodNode?.node ?? null,
          rodSideArea: spec.rodSideArea,
          ambientArea: spec.ambientArea,
          strokeM: spec.strokeM,
          deadVolumeCapM3: spec.deadVolumeCapM3,
          deadVolumeRodM3: spec.deadVolumeRodM3,
          movingMassKg: spec.movingMassKg,
          loadN: spec.loadN,
          coulombN: spec.coulombN,
          breakawayN: spec.breakawayN,
          viscousNsPerM: spec.viscousNsPerM,
          springPreloadN: spec.springPreloadN,
          springRateNPerM: spec.springRateNPerM,
          startPositionM: spec.startPositionM,
          polytropicExponent: spec.polytropicExponent,
        });
        const index = pistons.length - 1;
        nodes[spec.capNode.node]!.chambers.push({ piston: index, side: 'cap' });
        if (spec.rodNode) nodes[spec.rodNode.node]!.chambers.push({ piston: index, side: 'rod' });
        for (const chamber of [spec.capNode, spec.rodNode]) {
          if (chamber && spec.polytropicExponent !== undefined) nodes[chamber.node]!.polytropicExponent = spec.polytropicExponent;
        }
        pistonOf.set(component.id, index);
        return { piston: index };
      },
      actuationLinks: (): ActuationLink[] =>
        (links.get(component.id) ?? []).flatMap((l) => {
          const piston = pistonOf.get(l.from);
          if (piston === undefined) {
            diagnostics.push({ code: 'link-not-actuator', severity: 'warning', message: `${component.tag} is linked to ${byId.get(l.from)?.tag}, which has no piston`, componentId: component.id });
            return [];
          }
          return [{ piston: { piston }, positionM: l.positionM }];
        }),
      ambientPa: () => ambientPa,
    };
    for (const p of type.ports) if (p.role !== 'terminal') portNode(p.id);
    behaviours.push({ componentId: component.id, tag: component.tag, behaviour: type.build(ctx) });
  }

  // A tube's line is one node whatever its length, so a leak anywhere along it vents that node;
  // b = 0.5 for an irregular gap (common practice: its C matters far more than its b).
  for (const tube of document.tubes) {
    const node = nodeOfRoot.get(uf.find(key(tube.from.component, tube.from.port)));
    if (!tube.leakConductance || node === undefined || node === atmosphere) continue;
    restrictions.push({ name: 'leak', owner: tube.id, from: node, to: atmosphere, conductance: tube.leakConductance, criticalRatio: 0.5, opening: 1 });
  }

  const wireNets = document.wires.map((w) => ({ wireId: w.id, net: netOf(w.from.component, w.from.port) }));
  control.useNets(netOfRoot.size);
  for (const node of nodes) {
    if (!node.fixed && node.volumeM3 <= 0 && node.chambers.length === 0) node.volumeM3 = PORT_VOLUME_M3;
  }
  const componentIds = new Map<string, number>();
  behaviours.forEach((b, i) => {
    componentIds.set(b.componentId, i);
    componentIds.set(b.tag, i);
  });
  return { model: { ambientPa, temperatureK, nodes, restrictions, pistons, behaviours, portNodes, componentIds, control, wireNets }, diagnostics };
}

/** Adds a node with every field present (holder and exponent perhaps undefined): one shape for all, as for passages and pistons. */
function addNode(nodes: NodeModel[], node: NodeModel): number {
  const { name, volumeM3, fixed, fixedPressurePa, holder, chambers, polytropicExponent } = node;
  nodes.push({ name, volumeM3, fixed, fixedPressurePa, holder, chambers, polytropicExponent });
  return nodes.length - 1;
}

function rank(type: ComponentType | undefined): number {
  return type?.category === 'actuator' ? 0 : 1;
}
