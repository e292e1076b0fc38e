import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { StepList } from '@/components/proof/StepList';
import { twoCylinderSequence } from './sequence-fixture';

const rows = (markup: string) => [...markup.matchAll(/<tr[^>]*data-testid="step-list-row"[^>]*>([\s\S]*?)<\/tr>/g)].map((m) => m[1]!.replace(/<[^>]+>/g, '|').replace(/\|+/g, '|'));

describe('StepList', () => {
  const markup = renderToStaticMarkup(<StepList sequence={twoCylinderSequence} />);

  it('lists the initial situation and every observed step with transition, actions and times', () => {
    expect(rows(markup)).toEqual([
      '|0|initial|start of the run|1A1 retracted, 2A1 retracted|0.000|0.250|',
      '|1|S1 pressed|1A1 moves out|0.250|0.750|',
      '|2|1B2 on|2A1 moves out|0.750|1.100|',
      '|3|2A1 reached its end (extended)|1A1 moves in|2A1 moves in|1.100|1.600|',
    ]);
  });

  it('labels its columns in GRAFCET words, with the unit of time', () => {
    for (const heading of ['Step', 'Transition into it (observed)', 'Actions', 'Start, s', 'End, s']) expect(markup).toContain(`>${heading}</th>`);
  });

  it('says it records one run, not a controller program, and carries the safety caution', () => {
    expect(markup).toContain('it is not a controller program');
    expect(markup).toContain('risk assessment');
  });

  it('marks a step with no motion and one with no observed transition', () => {
    const dwell = renderToStaticMarkup(
      <StepList
        sequence={{
          actuators: twoCylinderSequence.actuators,
          steps: [twoCylinderSequence.steps[0]!, { index: 1, startS: 0.25, endS: 0.5, motions: [], trigger: null, cause: null }],
        }}
      />,
    );
    expect(rows(dwell)[1]).toBe('|1|nothing observed|none: every actuator rests|0.250|0.500|');
  });
});
