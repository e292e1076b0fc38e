import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { addComponent, connect } from '@/components/editor/document-commands';
import { edgesOf, junctionPorts, nodesOf } from '@/components/editor/flow-mapping';
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

  it('sizes a turned component by its turned box', () => {
    const turned = produce(document, (d) => {
      d.components[0]!.rotation = 180;
      d.components[1]!.rotation = 90;
    });
    const nodes = nodesOf(turned, { components: [], tubes: [], wires: [] });
    const valve = symbolGeometry('valve-5-2');
    expect([nodes[0]!.width, nodes[0]!.height]).toEqual([valve.width, valve.height]);
    expect([nodes[1]!.width, nodes[1]!.height]).toEqual([50, 160]);
  });

  it('draws tubes and wires as edges between the ports’ handles, each kind in its own style', () => {
    const edges = edgesOf(document, { components: [], tubes: [], wires: ['w1'] });
    expect(edges).toEqual([
      expect.objectContaining({ id: 't1', source: ids[0], sourceHandle: '4', target: ids[1], targetHandle: 'A', type: 'connection', className: 'airproof-tube', selected: false, data: { kind: 'tube', bends: [], dots: [] } }),
      expect.objectContaining({ id: 'w1', source: ids[2], sourceHandle: 'L+', target: ids[3], targetHandle: 'A1', type: 'connection', className: 'airproof-wire', selected: true, data: { kind: 'wire', bends: [], dots: [] } }),
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

describe('junctions', () => {
  const none = { components: [], tubes: [], wires: [] };
  const ids: string[] = [];
  const document = produce(emptyDocument(), (d) => {
    ids.push(addComponent(d, 'air-supply', { x: 0, y: 300 }), addComponent(d, 'valve-5-2', { x: -100, y: 150 }), addComponent(d, 'valve-5-2', { x: 100, y: 150 }));
    ids.push(addComponent(d, 'dc-supply', { x: 400, y: 0 }), addComponent(d, 'relay-coil', { x: 400, y: 200 }), addComponent(d, 'relay-coil', { x: 500, y: 200 }));
    const [supply, left, right, dc, k1, k2] = ids as [string, string, string, string, string, string];
    connect(d, { component: left, port: '1' }, { component: supply, port: '2' });
    connect(d, { component: supply, port: '2' }, { component: right, port: '1' });
    connect(d, { component: left, port: '4' }, { component: right, port: '2' });
    connect(d, { component: dc, port: 'L+' }, { component: k1, port: 'A1' });
    connect(d, { component: dc, port: 'L+' }, { component: k2, port: 'A1' });
    d.tubes[0]!.bends = [{ x: 30, y: 240 }];
  });

  it('are the ports two or more tubes end at and the terminals two or more wires end at', () => {
    expect(junctionPorts(document)).toEqual([
      { component: ids[0], port: '2', connections: ['t1', 't2'] },
      { component: ids[3], port: 'L+', connections: ['w1', 'w2'] },
    ]);
    expect(junctionPorts(produce(document, (d) => void d.tubes.splice(1, 1)))).toEqual([{ component: ids[3], port: 'L+', connections: ['w1', 'w2'] }]);
  });

  it('get their dot from the first tube or wire there, at the end that meets them; edges carry their bends', () => {
    const edges = edgesOf(document, none);
    expect(edges.map((e) => [e.id, e.data?.dots])).toEqual([
      ['t1', ['target']],
      ['t2', []],
      ['t3', []],
      ['w1', ['source']],
      ['w2', []],
    ]);
    expect(edges[0]!.data?.bends).toEqual([{ x: 30, y: 240 }]);
  });
});
