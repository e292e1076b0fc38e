import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { checksOf, memoizedChecks, problemsByItem } from '@/components/editor/diagnostics';
import { addComponent, connect, moveComponents } from '@/components/editor/document-commands';
import { emptyDocument } from '@/engine/document/schema';

describe('checks on the drawing', () => {
  it('lists what the engine finds, errors before warnings, and marks each item with its worst finding', () => {
    const ids: string[] = [];
    const document = produce(emptyDocument(), (d) => {
      ids.push(addComponent(d, 'valve-5-2', { x: 0, y: 0 }), addComponent(d, 'cylinder-double-acting', { x: 0, y: -100 }), addComponent(d, 'relay-contact-no', { x: 200, y: 0 }));
      connect(d, { component: ids[0]!, port: '4' }, { component: ids[1]!, port: 'A' });
      // A wire on an air port, which the editor itself never draws (an error); the contact names no coil (a warning).
      d.wires.push({ id: 'w9', from: { component: ids[0]!, port: '1' }, to: { component: ids[2]!, port: '13' }, bends: [] });
    });
    const checks = checksOf(document);
    const severities = checks.map((c) => c.severity);
    expect(severities).toContain('error');
    expect(severities).toContain('warning');
    expect(severities.lastIndexOf('error')).toBeLessThan(severities.indexOf('warning'));
    const marks = problemsByItem(checks);
    expect(marks.get(ids[2]!)).toBe('warning');
    expect(marks.get('w9')).toBe('error');
  });

  it('keeps an error mark when a warning for the same item follows', () => {
    const marks = problemsByItem([
      { code: 'a', severity: 'error', message: 'x', componentId: 'v' },
      { code: 'b', severity: 'warning', message: 'y', componentId: 'v' },
      { code: 'c', severity: 'warning', message: 'z', tubeId: 't1' },
    ]);
    expect(marks.get('v')).toBe('error');
    expect(marks.get('t1')).toBe('warning');
  });

  it('finds nothing to report on an empty drawing', () => {
    expect(checksOf(emptyDocument())).toEqual([]);
  });
});

describe('checks while drawing', () => {
  it('are worked out again when the drawing changes, but not when a part only moves', () => {
    const checksFor = memoizedChecks();
    const start = produce(emptyDocument(), (d) => void addComponent(d, 'valve-5-2', { x: 0, y: 0 }));
    const first = checksFor(start);
    const moved = produce(start, (d) => moveComponents(d, [{ id: start.components[0]!.id, x: 40, y: 80 }]));
    expect(checksFor(moved)).toBe(first);
    const renamed = produce(moved, (d) => void (d.components[0]!.tag = '2V1'));
    const again = checksFor(renamed);
    expect(again).not.toBe(first);
    expect(again.map((c) => c.message).join()).toContain('2V1');
  });
});
