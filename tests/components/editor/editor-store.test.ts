import { describe, expect, it } from 'vitest';
import { addComponent, connect, removeItems } from '@/components/editor/document-commands';
import { createEditorStore } from '@/components/editor/editor-store';
import { emptyDocument } from '@/engine/document/schema';

function storeWithValveAndCylinder() {
  const store = createEditorStore(emptyDocument());
  const valve = store.getState().edit('Add', (d) => addComponent(d, 'valve-5-2', { x: 0, y: 0 }));
  const cylinder = store.getState().edit('Add', (d) => addComponent(d, 'cylinder-double-acting', { x: 0, y: -200 }));
  return { store, valve, cylinder };
}

describe('editor history', () => {
  it('undoes and redoes each edit in turn, back to the empty document and forward again', () => {
    const { store, valve, cylinder } = storeWithValveAndCylinder();
    store.getState().edit('Connect', (d) => connect(d, { component: valve, port: '4' }, { component: cylinder, port: 'A' }));
    expect(store.getState().document.tubes).toHaveLength(1);

    store.getState().undo();
    expect(store.getState().document.tubes).toHaveLength(0);
    expect(store.getState().document.components.map((c) => c.id)).toEqual([valve, cylinder]);
    store.getState().undo();
    store.getState().undo();
    expect(store.getState().document).toEqual(emptyDocument());
    // Nothing left to undo: a further undo changes nothing.
    store.getState().undo();
    expect(store.getState().document).toEqual(emptyDocument());

    store.getState().redo();
    store.getState().redo();
    store.getState().redo();
    expect(store.getState().document.components).toHaveLength(2);
    expect(store.getState().document.tubes[0]).toMatchObject({ from: { component: valve, port: '4' }, to: { component: cylinder, port: 'A' } });
  });

  it('drops the redo steps when a new edit follows an undo', () => {
    const { store } = storeWithValveAndCylinder();
    store.getState().undo();
    expect(store.getState().future).toHaveLength(1);
    store.getState().edit('Add', (d) => addComponent(d, 'throttle', { x: 50, y: 50 }));
    expect(store.getState().future).toHaveLength(0);
    store.getState().redo();
    expect(store.getState().document.components.map((c) => c.type)).toEqual(['valve-5-2', 'throttle']);
  });

  it('makes a whole drag one undo step, however many moves it took', () => {
    const { store, valve } = storeWithValveAndCylinder();
    const steps = store.getState().past.length;
    for (let x = 10; x <= 100; x += 10) store.getState().dragTo([{ id: valve, x, y: x / 2 }]);
    expect(store.getState().past).toHaveLength(steps);
    store.getState().endDrag();
    expect(store.getState().past).toHaveLength(steps + 1);
    expect(store.getState().document.components[0]!.position).toEqual({ x: 100, y: 50 });
    store.getState().undo();
    expect(store.getState().document.components[0]!.position).toEqual({ x: 0, y: 0 });
    store.getState().redo();
    expect(store.getState().document.components[0]!.position).toEqual({ x: 100, y: 50 });
  });

  it('keeps selection out of the history and counts changes since the last save', () => {
    const { store, valve } = storeWithValveAndCylinder();
    expect(store.getState().changesSinceSave).toBe(2);
    store.getState().markSaved();
    store.getState().select({ components: [valve], tubes: [], wires: [] });
    expect(store.getState().changesSinceSave).toBe(0);
    expect(store.getState().past).toHaveLength(2);
    store.getState().edit('Remove', (d) => removeItems(d, store.getState().selection));
    expect(store.getState().changesSinceSave).toBe(1);
    expect(store.getState().document.components.map((c) => c.type)).toEqual(['cylinder-double-acting']);
  });

  it('records nothing for an edit that changes nothing', () => {
    const { store } = storeWithValveAndCylinder();
    const steps = store.getState().past.length;
    store.getState().edit('Remove nothing', (d) => removeItems(d, { components: [], tubes: [], wires: [] }));
    expect(store.getState().past).toHaveLength(steps);
  });
});
