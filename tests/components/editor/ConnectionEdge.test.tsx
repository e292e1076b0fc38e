import { Position, ReactFlowProvider, type EdgeProps } from '@xyflow/react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { ConnectionEdge } from '@/components/editor/ConnectionEdge';
import type { ConnectionFlowEdge } from '@/components/editor/flow-mapping';

// Rendered to markup without a DOM: this checks what a tube or wire draws; the route itself is
// tested in orthogonal-route, and the handles need a live canvas.

function render(props: Partial<EdgeProps<ConnectionFlowEdge>> = {}): string {
  return renderToStaticMarkup(
    <ReactFlowProvider>
      <svg>
        <ConnectionEdge
          id="t1"
          source="valve"
          target="cylinder"
          sourceX={0}
          sourceY={100}
          sourcePosition={Position.Top}
          targetX={100}
          targetY={0}
          targetPosition={Position.Bottom}
          data={{ kind: 'tube', bends: [], dots: [] }}
          {...props}
        />
      </svg>
    </ReactFlowProvider>,
  );
}

describe('a tube or wire on the canvas', () => {
  it('is drawn square from port to port, through its bends', () => {
    expect(render()).toContain('d="M 0 100 L 0 50 L 100 50 L 100 0"');
    expect(render({ data: { kind: 'tube', bends: [{ x: 100, y: 70 }], dots: [] } })).toContain('d="M 0 100 L 0 70 L 100 70 L 100 0"');
  });

  it('keeps the colour a run gives it, and its label halfway along', () => {
    const markup = render({ style: { stroke: '#2a9d8f', strokeWidth: 3 }, label: '2.50 bar (gauge)' });
    expect(markup).toContain('<path id="t1" style="stroke:#2a9d8f;stroke-width:3" d="M 0 100 L 0 50 L 100 50 L 100 0"');
    expect(markup).toMatch(/<g transform="translate\(50 50\)"[^>]*>.*2\.50 bar \(gauge\)<\/text>/);
  });

  it('draws the junction dot of its port one stub out, where the branches part', () => {
    expect(render()).not.toContain('airproof-junction');
    expect(render({ data: { kind: 'tube', bends: [], dots: ['source'] } })).toContain('<circle class="airproof-junction" cx="0" cy="90" r="3.5"></circle>');
    expect(render({ data: { kind: 'wire', bends: [], dots: ['target'] }, style: { stroke: '#2a9d8f' } })).toContain(
      '<circle class="airproof-junction" cx="100" cy="10" r="2.5" style="fill:#2a9d8f"></circle>',
    );
  });
});
