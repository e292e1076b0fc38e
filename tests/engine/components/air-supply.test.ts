import { describe, expect, it } from 'vitest';
import { bar, eventTime, eventsOf, portBar, runCircuit, withSupply } from './harness';

describe('air-supply', () => {
  it('holds its set pressure on a dead-end line', () => {
    for (const p of [2, 6, 8]) {
      const doc = withSupply(p).add('res', 'reservoir', { volume: 1e-4 }).tube('sup:2', 'res:1').build();
      expect(Math.abs(portBar(runCircuit(doc, [], 0.5), 'sup', '2', 0.45) - p)).toBeLessThan(0.01);
    }
  });

  it('set to 0 (loss of air): a pressurised line falls to ambient through a pilot valve that springs back and exhausts', () => {
    // Pilot-operated 3/2 NC valve `pv`, piloted from the supply itself, feeding a 0.1 L line.
    const doc = withSupply(6)
      .add('pv', 'valve-3-2-nc', { actuation: 'pilot' })
      .add('res', 'reservoir', { volume: 1e-4 })
      .tube('sup:2', 'pv:1')
      .tube('sup:2', 'pv:12')
      .tube('pv:2', 'res:1')
      .build();
    const trace = runCircuit(doc, [{ t: 1, component: 'sup', action: 'set', value: 0 }], 2.5);
    expect(Math.abs(portBar(trace, 'pv', '2', 0.95) - 6)).toBeLessThan(0.05);
    expect(eventsOf(trace, 'sup', 'supply-changed')).toHaveLength(1);
    expect(eventTime(trace, 'pv', 'switched', 1, 'exhausting')).toBeLessThan(1.2);
    expect(portBar(trace, 'pv', '2', 2.45)).toBeLessThan(0.05);
    expect(portBar(trace, 'sup', '2', 2.45)).toBeLessThan(0.01);
  });

  it('set to 0: a line held open to it drains back to ambient too', () => {
    const doc = withSupply(6)
      .add('pb', 'valve-3-2-nc')
      .add('res', 'reservoir', { volume: 1e-4 })
      .tube('sup:2', 'pb:1')
      .tube('pb:2', 'res:1')
      .build();
    const trace = runCircuit(
      doc,
      [
        { t: 0.05, component: 'pb', action: 'press' },
        { t: 1, component: 'sup', action: 'set', value: 0 },
      ],
      2.5,
    );
    expect(Math.abs(portBar(trace, 'pb', '2', 0.95) - 6)).toBeLessThan(0.05);
    expect(portBar(trace, 'pb', '2', 2.45)).toBeLessThan(0.05);
  });

  it('restores the line when the air comes back', () => {
    const doc = withSupply(6).add('res', 'reservoir', { volume: 1e-4 }).tube('sup:2', 'res:1').build();
    const trace = runCircuit(
      doc,
      [
        { t: 0.5, component: 'sup', action: 'set', value: 0 },
        { t: 1.5, component: 'sup', action: 'set', value: bar(5) },
      ],
      2.5,
    );
    expect(portBar(trace, 'sup', '2', 1.45)).toBeLessThan(0.05);
    expect(Math.abs(portBar(trace, 'sup', '2', 2.45) - 5)).toBeLessThan(0.01);
  });
});
