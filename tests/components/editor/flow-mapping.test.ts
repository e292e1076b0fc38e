import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { addComponent, connect } from '@/components/editor/document-commands';
import { edgesOf, nodesOf } from '@/components/editor/flow-mapping';
import { symbolGeometry } from '@/components/symbols/geometry';
import { emptyDocument } from '@/engine/document/schema';

describe('the canvas as a view of the document', () => {
  const ids: string[] = [];
  const document = produce(emptyDocument(), (d) => {
    ids.push(addComponent(d, 'valve-5-2', { x: 100, y: 200 }), addComponent(d, 'cylinder-double-acting', { x: 100, y: 0 }));
    ids.push(addComponent(d, 'dc-supply', { x: 400, y: 0 }), addComponent(d, 'relay-coil', { x: 400, y: 200 }));
    connect(d, { component: ids[0]!, port: '4' }, { component: ids[1]!, port: 'A' });
    connect(d, { component: ids[2]!, port: 'L+' }, { component: ids[3]!, port: 'A1' });
  });

  it('draws one node per component at its position, sized by its symbol, selected as the editor says', () => {
    const nodes = nodesOf(document, { components: [ids[1]!], tubes: [], wires: [] });
    expect(nodes.map((n) => [n.id, n.position, n.selected])).toEqual([
      [ids[0], { x: 100, y: 200 }, false],
      [ids[1], { x: 100, y: 0 }, true],
      [ids[2], { x: 400, y: 0 }, false],
      [ids[3], { x: 400, y: 200 }, false],
    ]);
    const valve = symbolGeometry('valve-5-2');
    expect(nodes[0]).toMatchObject({ type: 'component', width: valve.width, height: valve.height, data: { component: document.components[0] } });
  });

  it('draws tubes and wires as edges between the ports’ handles, each kind in its own style', () => {
    const edges = edgesOf(document, { components: [], tubes: [], wires: ['w1'] });
    expect(edges).toEqual([
      expect.objectContaining({ id: 't1', source: ids[0], sourceHandle: '4', target: ids[1], targetHandle: 'A', type: 'smoothstep', className: 'airproof-tube', selected: false, data: { kind: 'tube' } }),
      expect.objectContaining({ id: 'w1', source: ids[2], sourceHandle: 'L+', target: ids[3], targetHandle: 'A1', type: 'step', className: 'airproof-wire', selected: true, data: { kind: 'wire' } }),
    ]);
  });

  it('marks the components, tubes and wires the checks found something on', () => {
    const problems = new Map([[ids[0]!, 'error' as const], ['w1', 'warning' as const]]);
    const nodes = nodesOf(document, { components: [], tubes: [], wires: [] }, problems);
    expect(nodes.map((n) => n.data.problem)).toEqual(['error', undefined, undefined, undefined]);
    const edges = edgesOf(document, { components: [], tubes: [], wires: [] }, problems);
    expect(edges.map((e) => e.className)).toEqual(['airproof-tube', 'airproof-wire airproof-warning']);
  });
});
