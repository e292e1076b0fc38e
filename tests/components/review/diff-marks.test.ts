import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { addComponent, connect, moveComponents } from '@/components/editor/document-commands';
import { marksOf, removedOf } from '@/components/review/diff-marks';
import { diffDocuments } from '@/engine/document/diff';
import { emptyDocument } from '@/engine/document/schema';

const ids: string[] = [];
const before = produce(emptyDocument(), (d) => {
  ids.push(
    addComponent(d, 'valve-5-2', { x: 0, y: 0 }),
    addComponent(d, 'throttle', { x: 100, y: 0 }),
    addComponent(d, 'cylinder-double-acting', { x: 0, y: -200 }),
    addComponent(d, 'silencer', { x: 200, y: 0 }),
  );
  connect(d, { component: ids[0]!, port: '4' }, { component: ids[1]!, port: '1' });
  connect(d, { component: ids[1]!, port: '2' }, { component: ids[2]!, port: 'A' });
  connect(d, { component: ids[0]!, port: '3' }, { component: ids[3]!, port: '1' });
});
const [valve, throttle, cylinder, silencer] = ids as [string, string, string, string];

describe('marks for a comparison', () => {
  // The throttle is set differently, the cylinder only moved, the silencer removed (with its tube), a check valve added.
  let added = '';
  const after = produce(before, (d) => {
    d.components.find((c) => c.id === throttle)!.parameters.opening = 0.25;
    moveComponents(d, [{ id: cylinder, x: 40, y: -200 }]);
    d.components = d.components.filter((c) => c.id !== silencer);
    d.tubes = d.tubes.filter((t) => t.to.component !== silencer && t.from.component !== silencer);
    added = addComponent(d, 'check-valve', { x: 300, y: 0 });
  });
  const diff = diffDocuments(before, after);

  it('marks added and behaviour-changed parts, and leaves a part that only moved unmarked', () => {
    const marks = marksOf(diff);
    expect(marks.components.get(added)).toBe('added');
    expect(marks.components.get(throttle)).toBe('changed');
    expect(marks.components.has(cylinder)).toBe(false);
    expect(marks.components.has(valve)).toBe(false);
  });

  it('keeps what was removed, with the tubes that went with it, to draw faded', () => {
    const removed = removedOf(before, diff);
    expect(removed.components.map((c) => c.id)).toEqual([silencer]);
    expect(removed.tubes.map((t) => t.to.component)).toEqual([silencer]);
    expect(removed.links).toEqual([]);
  });
});
