import { componentTypeById } from '../components/registry';
import { parameterDefaults } from '../components/types';
import { settingsSchema, type CircuitComponent, type CircuitDocument, type Tube } from './schema';

/**
 * What changed between two revisions of a circuit document, for peer review. Items are matched
 * by their stable id, so a renamed part is one part with a new tag, not one removed and one
 * added. Every change says whether it can alter what the circuit does (`behaviour`) or only how
 * it is drawn and annotated (`drawing`), so a reviewer can read the first kind first.
 */

export type ChangeEffect = 'behaviour' | 'drawing';

export type ParameterValue = number | string | boolean;

/** A drawing position in canvas units. */
export type Point = CircuitComponent['position'];

/** What tubes and wires share: a tube is a wire with a size. */
type Connection = CircuitDocument['wires'][number];
type Link = CircuitDocument['links'][number];
type Settings = CircuitDocument['settings'];

/**
 * One end of a tube or wire. `tag` is the tag its component has in the revision the end belongs
 * to (the component id when that revision has no such component).
 */
export interface ConnectionEnd {
  readonly component: string;
  readonly port: string;
  readonly tag: string;
}

export interface ConnectionEnds {
  readonly from: ConnectionEnd;
  readonly to: ConnectionEnd;
}

/** A component a link couples, with its tag as for {@link ConnectionEnd}. */
export interface LinkEnd {
  readonly component: string;
  readonly tag: string;
}

export type ComponentChange =
  | { readonly kind: 'type'; readonly before: string; readonly after: string; readonly affects: 'behaviour' }
  | { readonly kind: 'tag'; readonly before: string; readonly after: string; readonly affects: 'behaviour' }
  /**
   * A parameter whose value in use differs: the stored value, or the type's default where none is
   * stored. A side lacks the value when its type has no such parameter and none is stored.
   */
  | { readonly kind: 'parameter'; readonly name: string; readonly before?: ParameterValue; readonly after?: ParameterValue; readonly affects: 'behaviour' }
  | { readonly kind: 'label' | 'notes'; readonly before?: string; readonly after?: string; readonly affects: 'drawing' }
  | { readonly kind: 'position'; readonly before: Point; readonly after: Point; readonly affects: 'drawing' }
  | { readonly kind: 'rotation'; readonly before: CircuitComponent['rotation']; readonly after: CircuitComponent['rotation']; readonly affects: 'drawing' }
  | { readonly kind: 'mirrored'; readonly before: boolean; readonly after: boolean; readonly affects: 'drawing' };

type EndsChange = { readonly kind: 'ends'; readonly before: ConnectionEnds; readonly after: ConnectionEnds; readonly affects: 'behaviour' };
type BendsChange = { readonly kind: 'bends'; readonly before: readonly Point[]; readonly after: readonly Point[]; readonly affects: 'drawing' };

export type TubeChange =
  | EndsChange
  /** Length and bore, m: together they set the tube's volume and so how fast its line fills. */
  | { readonly kind: 'lengthM' | 'innerDiameterM'; readonly before: number; readonly after: number; readonly affects: 'behaviour' }
  | BendsChange;

export type WireChange = EndsChange | BendsChange;

export type LinkChange =
  | { readonly kind: 'kind'; readonly before: Link['kind']; readonly after: Link['kind']; readonly affects: 'behaviour' }
  | { readonly kind: 'from' | 'to'; readonly before: LinkEnd; readonly after: LinkEnd; readonly affects: 'behaviour' }
  /** Stroke position that actuates, m from the retracted end; absent on solenoid links. */
  | { readonly kind: 'positionM'; readonly before?: number; readonly after?: number; readonly affects: 'behaviour' };

export type SettingName = keyof Settings;

export type SettingChange = {
  [K in SettingName]: { readonly kind: K; readonly before: Settings[K]; readonly after: Settings[K]; readonly affects: 'behaviour' };
}[SettingName];

export interface ComponentEntry {
  readonly id: string;
  readonly tag: string;
  /** Registry type id. */
  readonly type: string;
}

/** A component in both revisions: `tag` and `type` as it is after, `tagBefore` and `typeBefore` as it was. */
export interface ChangedComponent extends ComponentEntry {
  readonly tagBefore: string;
  readonly typeBefore: string;
  /** Behaviour changes first (type, tag, parameters in the type's order), then drawing changes. */
  readonly changes: readonly ComponentChange[];
}

export interface ConnectionEntry extends ConnectionEnds {
  readonly id: string;
}

/** A tube or wire in both revisions, with its ends as they are after. */
export interface ChangedConnection<Change> extends ConnectionEntry {
  readonly changes: readonly Change[];
}

export interface LinkEntry {
  readonly id: string;
  readonly kind: Link['kind'];
  readonly from: LinkEnd;
  readonly to: LinkEnd;
  readonly positionM?: number;
}

export interface ChangedLink extends LinkEntry {
  readonly changes: readonly LinkChange[];
}

/** Added items as they are after, removed ones as they were before. */
export interface ItemDiff<Entry, Changed> {
  readonly added: readonly Entry[];
  readonly removed: readonly Entry[];
  readonly changed: readonly Changed[];
}

export interface DiffCounts {
  readonly added: number;
  readonly removed: number;
  readonly changed: number;
}

export interface DiffSummary {
  readonly components: DiffCounts;
  readonly tubes: DiffCounts;
  readonly wires: DiffCounts;
  readonly links: DiffCounts;
  /** Settings fields changed. */
  readonly settings: number;
  /** True when an item was added or removed, or any change affects behaviour: false when only the drawing changed. */
  readonly affectsBehaviour: boolean;
  readonly isEmpty: boolean;
}

/**
 * Components are listed by tag, then id; tubes, wires and links by the tags of their from and to
 * ends, then id. Changed items go by their tags after the change; tags compare with their numbers
 * as numbers, so 1V2 comes before 1V10.
 */
export interface DocumentDiff {
  readonly components: ItemDiff<ComponentEntry, ChangedComponent>;
  readonly tubes: ItemDiff<ConnectionEntry, ChangedConnection<TubeChange>>;
  readonly wires: ItemDiff<ConnectionEntry, ChangedConnection<WireChange>>;
  readonly links: ItemDiff<LinkEntry, ChangedLink>;
  readonly settings: readonly SettingChange[];
  readonly summary: DiffSummary;
}

export function diffDocuments(before: CircuitDocument, after: CircuitDocument): DocumentDiff {
  const sides = { before: new Revision(before), after: new Revision(after) };
  const components = diffComponents(before.components, after.components);
  const tubes = diffConnections(before.tubes, after.tubes, sides, tubeChanges);
  const wires = diffConnections(before.wires, after.wires, sides, (a, b): WireChange[] => [...endsChanges(a, b, sides), ...bendsChanges(a, b)]);
  const links = diffLinks(before.links, after.links, sides);
  const settings = diffSettings(before.settings, after.settings);
  return { components, tubes, wires, links, settings, summary: summarise({ components, tubes, wires, links }, settings) };
}

/** One side of the comparison: a document and its tags by component id. */
class Revision {
  private readonly tags: ReadonlyMap<string, string>;

  constructor(document: CircuitDocument) {
    this.tags = new Map(document.components.map((c) => [c.id, c.tag]));
  }

  tagOf(componentId: string): string {
    return this.tags.get(componentId) ?? componentId;
  }

  end(ref: { component: string; port: string }): ConnectionEnd {
    return { component: ref.component, port: ref.port, tag: this.tagOf(ref.component) };
  }

  ends(connection: Connection): ConnectionEnds {
    return { from: this.end(connection.from), to: this.end(connection.to) };
  }

  linkEnd(componentId: string): LinkEnd {
    return { component: componentId, tag: this.tagOf(componentId) };
  }
}

interface Sides {
  readonly before: Revision;
  readonly after: Revision;
}

const collator = new Intl.Collator('en', { numeric: true });

function compareKeys(a: readonly string[], b: readonly string[]): number {
  for (let i = 0; i < a.length; i += 1) {
    const order = collator.compare(a[i]!, b[i]!);
    if (order !== 0) return order;
  }
  return 0;
}

const byKey = <T>(key: (item: T) => readonly string[]) => (a: T, b: T) => compareKeys(key(a), key(b));
const componentOrder = byKey((c: ComponentEntry) => [c.tag, c.id]);
const connectionOrder = byKey((c: { id: string; from: { tag: string }; to: { tag: string } }) => [c.from.tag, c.to.tag, c.id]);

function matchById<T extends { id: string }>(before: readonly T[], after: readonly T[]) {
  const beforeById = new Map(before.map((item) => [item.id, item]));
  const afterById = new Map(after.map((item) => [item.id, item]));
  return {
    added: after.filter((item) => !beforeById.has(item.id)),
    removed: before.filter((item) => !afterById.has(item.id)),
    kept: before.flatMap((item) => {
      const counterpart = afterById.get(item.id);
      return counterpart ? [[item, counterpart] as const] : [];
    }),
  };
}

function diffComponents(before: readonly CircuitComponent[], after: readonly CircuitComponent[]): DocumentDiff['components'] {
  const { added, removed, kept } = matchById(before, after);
  const entry = (c: CircuitComponent): ComponentEntry => ({ id: c.id, tag: c.tag, type: c.type });
  const changed = kept
    .map(([a, b]): ChangedComponent => ({ ...entry(b), tagBefore: a.tag, typeBefore: a.type, changes: componentChanges(a, b) }))
    .filter((c) => c.changes.length > 0);
  return { added: added.map(entry).sort(componentOrder), removed: removed.map(entry).sort(componentOrder), changed: changed.sort(componentOrder) };
}

function componentChanges(a: CircuitComponent, b: CircuitComponent): ComponentChange[] {
  const changes: ComponentChange[] = [];
  if (a.type !== b.type) changes.push({ kind: 'type', before: a.type, after: b.type, affects: 'behaviour' });
  // Contacts, coils and timed inputs find their part by tag, so a rename can change what runs.
  if (a.tag !== b.tag) changes.push({ kind: 'tag', before: a.tag, after: b.tag, affects: 'behaviour' });
  changes.push(...parameterChanges(a, b));
  for (const kind of ['label', 'notes'] as const) {
    // An empty text shows as none, so turning one into the other is no change.
    const was = a[kind] || undefined;
    const is = b[kind] || undefined;
    if (was !== is) changes.push({ kind, before: was, after: is, affects: 'drawing' });
  }
  if (a.position.x !== b.position.x || a.position.y !== b.position.y) changes.push({ kind: 'position', before: a.position, after: b.position, affects: 'drawing' });
  if (a.rotation !== b.rotation) changes.push({ kind: 'rotation', before: a.rotation, after: b.rotation, affects: 'drawing' });
  if (a.mirrored !== b.mirrored) changes.push({ kind: 'mirrored', before: a.mirrored, after: b.mirrored, affects: 'drawing' });
  return changes;
}

/** Values in use: the stored ones over the type's defaults (the editor stores a value equal to its default as none at all). */
function parametersInUse(component: CircuitComponent): Record<string, ParameterValue> {
  const type = componentTypeById(component.type);
  return { ...(type ? parameterDefaults(type) : {}), ...component.parameters };
}

function parameterChanges(a: CircuitComponent, b: CircuitComponent): ComponentChange[] {
  const was = parametersInUse(a);
  const is = parametersInUse(b);
  const names = new Set([...Object.keys(is), ...Object.keys(was)]);
  return [...names]
    .filter((name) => was[name] !== is[name])
    .map((name) => ({ kind: 'parameter', name, before: was[name], after: is[name], affects: 'behaviour' }));
}

const samePort = (x: Connection['from'], y: Connection['from']) => x.component === y.component && x.port === y.port;

/** A tube or wire joins two ports either way round: drawn from the other end it is the same connection. */
const reversed = (a: Connection, b: Connection) => !samePort(a.from, b.from) && samePort(a.from, b.to) && samePort(a.to, b.from);

function endsChanges(a: Connection, b: Connection, sides: Sides): EndsChange[] {
  const same = (samePort(a.from, b.from) && samePort(a.to, b.to)) || reversed(a, b);
  return same ? [] : [{ kind: 'ends', before: sides.before.ends(a), after: sides.after.ends(b), affects: 'behaviour' }];
}

function bendsChanges(a: Connection, b: Connection): BendsChange[] {
  // Bends run from the `from` end, so a connection drawn from its other end lists them backwards.
  const route = reversed(a, b) ? [...b.bends].reverse() : b.bends;
  const same = a.bends.length === route.length && a.bends.every((p, i) => p.x === route[i]!.x && p.y === route[i]!.y);
  return same ? [] : [{ kind: 'bends', before: a.bends, after: b.bends, affects: 'drawing' }];
}

function tubeChanges(a: Tube, b: Tube, sides: Sides): TubeChange[] {
  const changes: TubeChange[] = endsChanges(a, b, sides);
  for (const kind of ['lengthM', 'innerDiameterM'] as const) {
    if (a[kind] !== b[kind]) changes.push({ kind, before: a[kind], after: b[kind], affects: 'behaviour' });
  }
  return [...changes, ...bendsChanges(a, b)];
}

function diffConnections<T extends Connection, Change>(
  before: readonly T[],
  after: readonly T[],
  sides: Sides,
  changesOf: (a: T, b: T, sides: Sides) => Change[],
): ItemDiff<ConnectionEntry, ChangedConnection<Change>> {
  const { added, removed, kept } = matchById(before, after);
  const changed = kept.map(([a, b]) => ({ id: b.id, ...sides.after.ends(b), changes: changesOf(a, b, sides) })).filter((c) => c.changes.length > 0);
  return {
    added: added.map((c) => ({ id: c.id, ...sides.after.ends(c) })).sort(connectionOrder),
    removed: removed.map((c) => ({ id: c.id, ...sides.before.ends(c) })).sort(connectionOrder),
    changed: changed.sort(connectionOrder),
  };
}

function diffLinks(before: readonly Link[], after: readonly Link[], sides: Sides): DocumentDiff['links'] {
  const { added, removed, kept } = matchById(before, after);
  const entry = (link: Link, side: Revision): LinkEntry => ({
    id: link.id,
    kind: link.kind,
    from: side.linkEnd(link.from),
    to: side.linkEnd(link.to),
    positionM: link.positionM,
  });
  const changed = kept
    .map(([a, b]): ChangedLink => {
      const changes: LinkChange[] = [];
      if (a.kind !== b.kind) changes.push({ kind: 'kind', before: a.kind, after: b.kind, affects: 'behaviour' });
      for (const end of ['from', 'to'] as const) {
        if (a[end] !== b[end]) changes.push({ kind: end, before: sides.before.linkEnd(a[end]), after: sides.after.linkEnd(b[end]), affects: 'behaviour' });
      }
      if (a.positionM !== b.positionM) changes.push({ kind: 'positionM', before: a.positionM, after: b.positionM, affects: 'behaviour' });
      return { ...entry(b, sides.after), changes };
    })
    .filter((link) => link.changes.length > 0);
  return {
    added: added.map((link) => entry(link, sides.after)).sort(connectionOrder),
    removed: removed.map((link) => entry(link, sides.before)).sort(connectionOrder),
    changed: changed.sort(connectionOrder),
  };
}

// Read from the schema so that a setting added there is compared without touching this file.
const SETTING_NAMES = Object.keys(settingsSchema.shape) as SettingName[];

function diffSettings(before: Settings, after: Settings): SettingChange[] {
  return SETTING_NAMES.filter((name) => before[name] !== after[name]).map((name) => ({ kind: name, before: before[name], after: after[name], affects: 'behaviour' }));
}

type ItemDiffs = Pick<DocumentDiff, 'components' | 'tubes' | 'wires' | 'links'>;

function summarise(items: ItemDiffs, settings: readonly SettingChange[]): DiffSummary {
  const count = (diff: ItemDiff<unknown, unknown>): DiffCounts => ({ added: diff.added.length, removed: diff.removed.length, changed: diff.changed.length });
  const lists: ReadonlyArray<ItemDiff<unknown, { changes: ReadonlyArray<{ affects: ChangeEffect }> }>> = [items.components, items.tubes, items.wires, items.links];
  const isEmpty = settings.length === 0 && lists.every((d) => d.added.length + d.removed.length + d.changed.length === 0);
  const affectsBehaviour =
    settings.length > 0 ||
    lists.some((d) => d.added.length > 0 || d.removed.length > 0 || d.changed.some((item) => item.changes.some((c) => c.affects === 'behaviour')));
  return {
    components: count(items.components),
    tubes: count(items.tubes),
    wires: count(items.wires),
    links: count(items.links),
    settings: settings.length,
    affectsBehaviour,
    isEmpty,
  };
}
