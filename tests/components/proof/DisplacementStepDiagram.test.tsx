import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DisplacementStepDiagram } from '@/components/proof/DisplacementStepDiagram';
import { twoCylinderSequence } from './sequence-fixture';

// Rendered to markup without a DOM, as the other view tests do: this checks what the diagram draws.

const count = (markup: string, fragment: string) => markup.split(fragment).length - 1;
const texts = (markup: string, testId: string) => [...markup.matchAll(new RegExp(`data-testid="${testId}"[^>]*>([^<]*)<`, 'g'))].map((m) => m[1]);

describe('DisplacementStepDiagram', () => {
  const markup = renderToStaticMarkup(<DisplacementStepDiagram sequence={twoCylinderSequence} />);

  it('draws one row per actuator, labelled with its tag and both ends', () => {
    expect(count(markup, 'data-testid="step-diagram-row"')).toBe(2);
    expect(markup).toMatch(/data-tag="1A1"[\s\S]*>1A1<\/text>/);
    expect(markup).toMatch(/data-tag="2A1"[\s\S]*>2A1<\/text>/);
    expect(count(markup, '>extended 1<')).toBe(2);
    expect(count(markup, '>retracted 0<')).toBe(2);
  });

  it('numbers the steps after the initial situation along the horizontal axis, with the boundary times in s', () => {
    expect(markup).toContain('>step<');
    expect(markup).toContain('>time, s<');
    expect(texts(markup, 'step-diagram-step')).toEqual(['1', '2', '3']);
    expect(texts(markup, 'step-diagram-time')).toEqual(['0.250', '0.750', '1.100', '1.600']);
  });

  it('draws each row from boundary to boundary, slanting in the step of a motion', () => {
    // Grid: label column 168 px, 72 px a step; row 1 spans y 40–104, its ends at y 54 (extended) and 90 (retracted).
    const lines = [...markup.matchAll(/<polyline points="([^"]+)"/g)].map((m) => m[1]);
    expect(lines).toEqual([
      '168,90 168,90 240,54 312,54 312,54 384,90',
      // 2A1 (row 2, 64 px lower): rests, goes out in step 2, halfway back in step 3.
      '168,154 240,154 240,154 312,118 312,118 384,136',
    ]);
  });

  it('draws a signal line from what opened each step to the motion it started', () => {
    const signals = [...markup.matchAll(/data-testid="step-diagram-signal" data-from="([^"]+)" data-to="([^"]+)"[^>]*>[\s\S]*?<line ([^>]+)>/g)].map((m) => [m[1], m[2], m[3]]);
    expect(signals.map(([from, to]) => [from, to])).toEqual([
      ['S1', '1A1'],
      ['1B2', '2A1'],
      ['2A1', '1A1'],
    ]);
    // Inputs and sensors come down from above the rows (y 34); 2A1's arrival (extended, y 118) points up to 1A1 leaving its extended end (y 54).
    expect(signals[0]![2]).toContain('x1="168" x2="168" y1="34" y2="90"');
    expect(signals[2]![2]).toContain('x1="312" x2="312" y1="118" y2="54"');
    expect(markup).toContain('<title>Step 3 began after: 2A1 reached its end (extended)</title>');
  });

  it('prints in black without a shadow, and scrolls sideways inside its box when narrow', () => {
    expect(markup).toContain('print:shadow-none');
    expect(markup).toContain('print:stroke-black');
    expect(markup).toContain('overflow-x-auto');
  });

  it('says so instead of drawing when nothing moved', () => {
    const still = renderToStaticMarkup(<DisplacementStepDiagram sequence={{ actuators: twoCylinderSequence.actuators, steps: [twoCylinderSequence.steps[0]!] }} />);
    expect(still).toContain('No actuator moved in this run');
    expect(still).not.toContain('<svg');
  });
});
