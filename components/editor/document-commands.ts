import { GRID } from '@/components/symbols/geometry';
import { placedGeometry, type Rotation } from '@/components/symbols/placement';
import { componentTypeById } from '@/engine/components/registry';
import type { PortRole } from '@/engine/components/types';
import type { CircuitComponent, CircuitDocument } from '@/engine/document/schema';
import { nextTag } from './tags';

/**
 * Edits of the circuit document, written as immer recipes on a draft: the editor store runs
 * them and records their patches for undo. Pure functions of the document, so they are tested
 * without a canvas.
 */

export interface PortRef {
  component: string;
  port: string;
}

/** What a new tube gets until the engineer sets it: half a metre of 4 mm bore (common practice for a valve-to-cylinder line). */
export const NEW_TUBE = { lengthM: 0.5, innerDiameterM: 0.004 } as const;

/** Adds a component of a registry type at a drawing position and returns its id (the type is known). */
export function addComponent(draft: CircuitDocument, typeId: string, position: { x: number; y: number }): string {
  const type = componentTypeById(typeId);
  if (!type) throw new Error(`unknown component type ${typeId}`);
  const id = freeId(draft, typeId);
  draft.components.push({
    id,
    type: typeId,
    tag: nextTag(type, draft.components.map((c) => c.tag)),
    parameters: {},
    position: { x: position.x, y: position.y },
    rotation: 0,
    mirrored: false,
  });
  return id;
}

/** Moves components to new drawing positions. */
export function moveComponents(draft: CircuitDocument, moves: ReadonlyArray<{ id: string; x: number; y: number }>): void {
  const byId = new Map(draft.components.map((c) => [c.id, c]));
  for (const move of moves) {
    const component = byId.get(move.id);
    if (component) component.position = { x: move.x, y: move.y };
  }
}

/**
 * Turns components clockwise by quarter turns (negative turns go anticlockwise), each about its
 * own centre: a part whose box changes shape moves so that its centre stays, to the nearest grid
 * point.
 */
export function rotateComponents(draft: CircuitDocument, ids: readonly string[], quarterTurns: number): void {
  const turns = ((quarterTurns % 4) + 4) % 4;
  if (turns === 0) return;
  // Rounded alike either way, so turning back puts the part exactly where it was.
  const shift = (d: number) => Math.sign(d) * snap(Math.abs(d));
  for (const { component, width, height } of placedBoxes(draft, ids)) {
    component.rotation = ((component.rotation + 90 * turns) % 360) as Rotation;
    const swapped = turns % 2 === 1;
    placeAlong(component, 'x', snap(component.position.x) + (swapped ? shift((width - height) / 2) : 0));
    placeAlong(component, 'y', snap(component.position.y) + (swapped ? shift((height - width) / 2) : 0));
  }
}

/**
 * Flips components left to right as they appear, each about its own upright centre line. The
 * document mirrors a symbol before turning it, so a part standing at a quarter turn also takes
 * the opposite turn; its box keeps its size and place.
 */
export function mirrorComponents(draft: CircuitDocument, ids: readonly string[]): void {
  const wanted = new Set(ids);
  for (const component of draft.components.filter((c) => wanted.has(c.id))) {
    component.mirrored = !component.mirrored;
    component.rotation = ((360 - component.rotation) % 360) as Rotation;
  }
}

export type Alignment = 'left' | 'centre' | 'right' | 'top' | 'middle' | 'bottom';

/** The axis an alignment moves parts along, and the point of each box it lines up (0 start, 1 end). */
const ALIGNMENTS: Readonly<Record<Alignment, { axis: 'x' | 'y'; at: number }>> = {
  left: { axis: 'x', at: 0 },
  centre: { axis: 'x', at: 0.5 },
  right: { axis: 'x', at: 1 },
  top: { axis: 'y', at: 0 },
  middle: { axis: 'y', at: 0.5 },
  bottom: { axis: 'y', at: 1 },
};

/**
 * Lines up two or more components by their placed boxes: their left edges on the leftmost,
 * right edges on the rightmost, centres on the middle of the whole selection (and the same up
 * and down). Fewer than two parts is no edit.
 */
export function alignComponents(draft: CircuitDocument, ids: readonly string[], how: Alignment): void {
  const boxes = placedBoxes(draft, ids);
  if (boxes.length < 2) return;
  const { axis, at } = ALIGNMENTS[how];
  const size = axis === 'x' ? 'width' : 'height';
  const start = Math.min(...boxes.map((b) => b.component.position[axis]));
  const end = Math.max(...boxes.map((b) => b.component.position[axis] + b[size]));
  const line = start + (end - start) * at;
  for (const box of boxes) placeAlong(box.component, axis, snap(line - box[size] * at));
}

export type DistributionAxis = 'horizontal' | 'vertical';

/**
 * Spaces the centres of three or more components evenly along an axis between the two outermost,
 * which stay where they are. Fewer than three parts is no edit.
 */
export function distributeComponents(draft: CircuitDocument, ids: readonly string[], axis: DistributionAxis): void {
  const boxes = placedBoxes(draft, ids);
  if (boxes.length < 3) return;
  const along = axis === 'horizontal' ? 'x' : 'y';
  const size = axis === 'horizontal' ? 'width' : 'height';
  const centre = (box: PlacedBox) => box.component.position[along] + box[size] / 2;
  const ordered = boxes.sort((a, b) => centre(a) - centre(b));
  const first = centre(ordered[0]!);
  const step = (centre(ordered[ordered.length - 1]!) - first) / (ordered.length - 1);
  ordered.forEach((box, i) => placeAlong(box.component, along, snap(first + step * i - box[size] / 2)));
}

export interface ItemSelection {
  components: readonly string[];
  tubes: readonly string[];
  wires: readonly string[];
}

/** Removes components (with every tube, wire and link that touches them), tubes and wires. */
export function removeItems(draft: CircuitDocument, items: ItemSelection): void {
  const gone = new Set(items.components);
  const touches = (end: PortRef) => gone.has(end.component);
  const tubes = new Set(items.tubes);
  const wires = new Set(items.wires);
  // Lists are replaced only when something leaves them, so an empty removal is no edit at all.
  const keep = <T>(list: T[], stays: (item: T) => boolean): T[] => (list.every(stays) ? list : list.filter(stays));
  draft.components = keep(draft.components, (c) => !gone.has(c.id));
  draft.tubes = keep(draft.tubes, (t) => !tubes.has(t.id) && !touches(t.from) && !touches(t.to));
  draft.wires = keep(draft.wires, (w) => !wires.has(w.id) && !touches(w.from) && !touches(w.to));
  draft.links = keep(draft.links, (l) => !gone.has(l.from) && !gone.has(l.to));
}

/**
 * Copies components of `source` into the document, with the tubes, wires and links that run
 * between them, shifted by an offset. `source` is the document itself for Duplicate, or the
 * document as it was when the parts were copied, for Paste. Each copy gets a new id and the next
 * free designation of its kind, and keeps its parameters and label. Returns the copies' ids, in
 * the order given; ids not in `source` are skipped.
 */
export function duplicateItems(
  draft: CircuitDocument,
  source: CircuitDocument,
  componentIds: readonly string[],
  offset: { x: number; y: number },
): string[] {
  const newIdOf = new Map<string, string>();
  for (const id of componentIds) {
    const original = source.components.find((c) => c.id === id);
    const type = original ? componentTypeById(original.type) : undefined;
    if (!original || !type || newIdOf.has(id)) continue;
    const copyId = freeId(draft, original.type);
    newIdOf.set(id, copyId);
    draft.components.push({
      ...original,
      id: copyId,
      tag: nextTag(type, draft.components.map((c) => c.tag)),
      parameters: { ...original.parameters },
      position: { x: original.position.x + offset.x, y: original.position.y + offset.y },
    });
  }
  const inside = (end: PortRef) => newIdOf.has(end.component);
  const moved = (end: PortRef) => ({ component: newIdOf.get(end.component)!, port: end.port });
  const shift = (p: { x: number; y: number }) => ({ x: p.x + offset.x, y: p.y + offset.y });
  for (const tube of source.tubes.filter((t) => inside(t.from) && inside(t.to))) {
    draft.tubes.push({ ...tube, id: freeConnectionId(draft, 't'), from: moved(tube.from), to: moved(tube.to), bends: tube.bends.map(shift) });
  }
  for (const wire of source.wires.filter((w) => inside(w.from) && inside(w.to))) {
    draft.wires.push({ ...wire, id: freeConnectionId(draft, 'w'), from: moved(wire.from), to: moved(wire.to), bends: wire.bends.map(shift) });
  }
  const takenLinks = new Set(draft.links.map((l) => l.id));
  for (const link of source.links.filter((l) => newIdOf.has(l.from) && newIdOf.has(l.to))) {
    let n = 1;
    while (takenLinks.has(`l${n}`)) n += 1;
    takenLinks.add(`l${n}`);
    draft.links.push({ ...link, id: `l${n}`, from: newIdOf.get(link.from)!, to: newIdOf.get(link.to)! });
  }
  return [...newIdOf.values()];
}

export type ConnectionCheck = { ok: true; kind: 'tube' | 'wire' } | { ok: false; reason: string };

/**
 * Whether two ports may be joined: air ports by a tube, electrical terminals by a wire, never
 * a port to itself, an air port to a terminal, or twice the same pair.
 */
export function checkConnection(document: CircuitDocument, a: PortRef, b: PortRef): ConnectionCheck {
  if (a.component === b.component && a.port === b.port) return { ok: false, reason: 'A port cannot be joined to itself.' };
  const roleA = roleOf(document, a);
  const roleB = roleOf(document, b);
  if (!roleA || !roleB) return { ok: false, reason: 'That port does not exist.' };
  const electricA = roleA === 'terminal';
  if (electricA !== (roleB === 'terminal')) return { ok: false, reason: 'An air port joins air ports only, and a terminal joins terminals only.' };
  const same = (x: PortRef, y: PortRef) => x.component === y.component && x.port === y.port;
  const existing = electricA ? document.wires : document.tubes;
  if (existing.some((c) => (same(c.from, a) && same(c.to, b)) || (same(c.from, b) && same(c.to, a)))) {
    return { ok: false, reason: 'These two ports are already joined.' };
  }
  return { ok: true, kind: electricA ? 'wire' : 'tube' };
}

/** Joins two ports with a tube or a wire (see checkConnection) and returns its id, or the reason it may not. */
export function connect(draft: CircuitDocument, a: PortRef, b: PortRef): { ok: true; id: string } | { ok: false; reason: string } {
  const check = checkConnection(draft, a, b);
  if (!check.ok) return check;
  const from = { component: a.component, port: a.port };
  const to = { component: b.component, port: b.port };
  if (check.kind === 'tube') {
    const id = freeConnectionId(draft, 't');
    draft.tubes.push({ id, from, to, ...NEW_TUBE, bends: [] });
    return { ok: true, id };
  }
  const id = freeConnectionId(draft, 'w');
  draft.wires.push({ id, from, to, bends: [] });
  return { ok: true, id };
}

const snap = (value: number) => Math.round(value / GRID) * GRID;

interface PlacedBox {
  component: CircuitComponent;
  width: number;
  height: number;
}

/** The components named, in document order, each with the size of its box as placed. */
function placedBoxes(draft: CircuitDocument, ids: readonly string[]): PlacedBox[] {
  const wanted = new Set(ids);
  return draft.components.filter((c) => wanted.has(c.id)).map((component) => {
    const { width, height } = placedGeometry(component.type, component);
    return { component, width, height };
  });
}

// Writing only what changes keeps an edit that moves nothing out of the undo history.
function placeAlong(component: CircuitComponent, axis: 'x' | 'y', value: number): void {
  if (component.position[axis] !== value) component.position[axis] = value;
}

function roleOf(document: CircuitDocument, ref: PortRef): PortRole | undefined {
  const component = document.components.find((c) => c.id === ref.component);
  const type = component ? componentTypeById(component.type) : undefined;
  return type?.ports.find((p) => p.id === ref.port)?.role;
}

function freeId(document: CircuitDocument, typeId: string): string {
  const taken = new Set(document.components.map((c) => c.id));
  for (let n = 1; ; n += 1) if (!taken.has(`${typeId}-${n}`)) return `${typeId}-${n}`;
}

function freeConnectionId(document: CircuitDocument, prefix: string): string {
  const taken = new Set([...document.tubes, ...document.wires].map((c) => c.id));
  for (let n = 1; ; n += 1) if (!taken.has(`${prefix}${n}`)) return `${prefix}${n}`;
}

/** The most bends the document schema lets a tube or wire keep. */
const MOST_BENDS = 64;

/**
 * Sets the bends a tube or wire is drawn through (canvas points, in order from its `from` end).
 * An unknown id, the same bends again or more than the document keeps is no edit.
 */
export function setBends(draft: CircuitDocument, kind: 'tube' | 'wire', id: string, bends: ReadonlyArray<{ x: number; y: number }>): void {
  const connections: Array<{ id: string; bends: Array<{ x: number; y: number }> }> = kind === 'tube' ? draft.tubes : draft.wires;
  const connection = connections.find((c) => c.id === id);
  if (!connection || bends.length > MOST_BENDS) return;
  const same = connection.bends.length === bends.length && connection.bends.every((b, i) => b.x === bends[i]!.x && b.y === bends[i]!.y);
  if (!same) connection.bends = bends.map(({ x, y }) => ({ x, y }));
}
