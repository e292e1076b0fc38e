import { componentTypeById } from '@/engine/components/registry';
import type { ParameterSpec } from '@/engine/components/types';
import type {
  ChangeEffect,
  ChangedComponent,
  ComponentChange,
  ConnectionEnd,
  ConnectionEnds,
  DocumentDiff,
  ItemDiff,
  LinkChange,
  LinkEntry,
  ParameterValue,
  Point,
  SettingName,
  TubeChange,
} from '@/engine/document/diff';
import { AMBIENT_PRESSURE_LIMITS, AMBIENT_TEMPERATURE_LIMITS, TUBE_BORE_LIMITS, TUBE_LENGTH_LIMITS } from '@/components/editor/inspector-commands';
import { displayUnitFor, formatWithUnit, QUANTITY_UNITS, type DisplayUnit } from '@/components/editor/quantity-units';

/**
 * A revision comparison as rows of a table a reviewer reads: one row per changed value, in the
 * units and words the editor's inspector uses, so a value reads the same in both places.
 */

export interface ChangeRow {
  /** The part's tag; a tube's or wire's ends ("1V2:2 – 1V3:1"); a link's parts ("1A1 → 1S2"); empty for circuit settings. */
  readonly tag: string;
  /** The parameter's label, or the field in words ("Length", "Position"); for an added or removed item, what it is. */
  readonly what: string;
  /** Empty for an added or removed item. */
  readonly before: string;
  /** "added" or "removed" for an item that is new or gone. */
  readonly after: string;
  readonly affects: ChangeEffect;
}

/** Shown for a value one side does not have. */
const NONE = '—';

/**
 * Rows for parts, then tubes, wires, links and settings (each added, removed, changed, in the
 * diff's order), with every row that can alter behaviour before those that only touch the
 * drawing.
 */
export function changeTableRows(diff: DocumentDiff): ChangeRow[] {
  const rows = [
    ...itemRows(diff.components, (c) => c.tag, (c) => typeLabel(c.type), componentRows),
    ...itemRows(diff.tubes, endsText, () => 'Tube', (tube) => tube.changes.map((change) => tubeRow(endsText(tube), change))),
    ...itemRows(diff.wires, endsText, () => 'Wire', (wire) => wire.changes.map((change) => tubeRow(endsText(wire), change))),
    ...itemRows(diff.links, linkText, () => 'Link', (link) => link.changes.map((change) => linkRow(linkText(link), change))),
    ...diff.settings.map((change) => settingRow(change.kind, change.before, change.after)),
  ];
  return [...rows.filter((r) => r.affects === 'behaviour'), ...rows.filter((r) => r.affects === 'drawing')];
}

function itemRows<Entry, Changed>(
  diff: ItemDiff<Entry, Changed>,
  tagOf: (entry: Entry) => string,
  whatOf: (entry: Entry) => string,
  changedRows: (item: Changed) => ChangeRow[],
): ChangeRow[] {
  const status = (after: 'added' | 'removed') => (entry: Entry): ChangeRow => ({ tag: tagOf(entry), what: whatOf(entry), before: '', after, affects: 'behaviour' });
  return [...diff.added.map(status('added')), ...diff.removed.map(status('removed')), ...diff.changed.flatMap(changedRows)];
}

const typeLabel = (typeId: string) => componentTypeById(typeId)?.label ?? typeId;
const orNone = (text: string | undefined) => text || NONE;
const yesNo = (value: boolean) => (value ? 'yes' : 'no');
const pointText = (p: Point) => `(${p.x}, ${p.y})`;
const portText = (end: ConnectionEnd) => `${end.tag}:${end.port}`;
const endsText = (ends: ConnectionEnds) => `${portText(ends.from)} – ${portText(ends.to)}`;
const linkText = (link: Pick<LinkEntry, 'from' | 'to'>) => `${link.from.tag} → ${link.to.tag}`;

function componentRows(component: ChangedComponent): ChangeRow[] {
  const specsBefore = componentTypeById(component.typeBefore)?.parameters;
  const specsAfter = componentTypeById(component.type)?.parameters;
  const row = (change: ComponentChange, what: string, before: string, after: string): ChangeRow => ({ tag: component.tag, what, before, after, affects: change.affects });
  return component.changes.map((change) => {
    switch (change.kind) {
      case 'type':
        return row(change, 'Type', typeLabel(change.before), typeLabel(change.after));
      case 'tag':
        return row(change, 'Tag', change.before, change.after);
      case 'parameter': {
        const before = specsBefore?.[change.name];
        const after = specsAfter?.[change.name];
        return row(change, (after ?? before)?.label ?? change.name, parameterText(before, change.before), parameterText(after, change.after));
      }
      case 'label':
        return row(change, 'Label', orNone(change.before), orNone(change.after));
      case 'notes':
        return row(change, 'Notes', orNone(change.before), orNone(change.after));
      case 'position':
        return row(change, 'Position', pointText(change.before), pointText(change.after));
      case 'rotation':
        return row(change, 'Rotation', `${change.before}°`, `${change.after}°`);
      case 'mirrored':
        return row(change, 'Mirrored', yesNo(change.before), yesNo(change.after));
    }
  });
}

/** A parameter value as the inspector shows it, with its unit; as stored when its type does not know it. */
function parameterText(spec: ParameterSpec | undefined, value: ParameterValue | undefined): string {
  if (value === undefined) return NONE;
  if (spec?.kind === 'number' && typeof value === 'number') return formatWithUnit(value, displayUnitFor(spec));
  if (spec?.kind === 'flag' && typeof value === 'boolean') return yesNo(value);
  return String(value);
}

const routeText = (bends: readonly Point[]) => (bends.length === 0 ? 'straight' : bends.map(pointText).join(' '));

/** Tubes and wires share ends and bends; only tubes have a size. */
function tubeRow(tag: string, change: TubeChange): ChangeRow {
  const row = (what: string, before: string, after: string): ChangeRow => ({ tag, what, before, after, affects: change.affects });
  switch (change.kind) {
    case 'ends':
      return row('Ends', endsText(change.before), endsText(change.after));
    case 'lengthM':
      return row('Length', formatWithUnit(change.before, TUBE_LENGTH_LIMITS.unit), formatWithUnit(change.after, TUBE_LENGTH_LIMITS.unit));
    case 'innerDiameterM':
      return row('Inner diameter', formatWithUnit(change.before, TUBE_BORE_LIMITS.unit), formatWithUnit(change.after, TUBE_BORE_LIMITS.unit));
    case 'bends':
      return row('Route', routeText(change.before), routeText(change.after));
  }
}

const STROKE_UNIT = QUANTITY_UNITS.length;
const strokeText = (positionM: number | undefined) => (positionM === undefined ? NONE : formatWithUnit(positionM, STROKE_UNIT));

function linkRow(tag: string, change: LinkChange): ChangeRow {
  const row = (what: string, before: string, after: string): ChangeRow => ({ tag, what, before, after, affects: change.affects });
  switch (change.kind) {
    case 'kind':
      return row('Coupling', change.before, change.after);
    case 'from':
      return row('From', change.before.tag, change.after.tag);
    case 'to':
      return row('To', change.before.tag, change.after.tag);
    case 'positionM':
      return row('Actuating position', strokeText(change.before), strokeText(change.after));
  }
}

// A Record over every setting name, so a setting added to the schema cannot go without its words and unit.
const SETTINGS: Readonly<Record<SettingName, { what: string; unit: DisplayUnit }>> = {
  ambientPressurePa: { what: 'Ambient pressure', unit: AMBIENT_PRESSURE_LIMITS.unit },
  ambientTemperatureK: { what: 'Ambient temperature', unit: AMBIENT_TEMPERATURE_LIMITS.unit },
};

function settingRow(name: SettingName, before: number, after: number): ChangeRow {
  const { what, unit } = SETTINGS[name];
  return { tag: '', what, before: formatWithUnit(before, unit), after: formatWithUnit(after, unit), affects: 'behaviour' };
}
