import { describe, expect, it } from 'vitest';
import { Hands, handOperationOf } from '@/components/editor/run/hands';

const part = (type: string, parameters = {}) => ({ id: 'x', type, tag: 'X', parameters, position: { x: 0, y: 0 }, rotation: 0 as const, mirrored: false });

describe('hands on a running drawing', () => {
  it('work a part as its type says, with its own parameters', () => {
    expect(handOperationOf(part('valve-3-2-nc'))).toBe('hold');
    expect(handOperationOf(part('valve-5-2', { actuation: 'lever-detent' }))).toBe('switch');
    expect(handOperationOf(part('valve-5-2', { actuation: 'pilot' }))).toBeNull();
    expect(handOperationOf(part('emergency-stop'))).toBe('strike');
    expect(handOperationOf(part('cylinder-double-acting'))).toBeNull();
    expect(handOperationOf(part('no-such-type'))).toBeNull();
  });

  it('press a held button on the way down and release it on the way up, once each', () => {
    const hands = new Hands();
    expect(hands.input('S1', 'hold', 'down', false, false)).toBe('press');
    expect(hands.input('S1', 'hold', 'down', false, false)).toBeNull();
    expect(hands.input('S1', 'hold', 'up', false, false)).toBe('release');
    // The pointer leaving the part after it was let go changes nothing.
    expect(hands.input('S1', 'hold', 'up', false, false)).toBeNull();
  });

  it('keep a button pressed with Shift until the next Shift+click, so two can be held at once', () => {
    const hands = new Hands();
    expect(hands.input('1S1', 'hold', 'down', true, false)).toBe('press');
    expect(hands.input('1S1', 'hold', 'up', false, false)).toBeNull();
    expect(hands.input('1S2', 'hold', 'down', true, false)).toBe('press');
    expect(hands.input('1S2', 'hold', 'up', false, false)).toBeNull();
    expect(hands.input('1S1', 'hold', 'down', true, false)).toBe('release');
    hands.clear();
    // After the run stopped, nothing is held any more: the next push presses again.
    expect(hands.input('1S2', 'hold', 'down', false, false)).toBe('press');
  });

  it('switch a detented part at each push, and strike an emergency stop, then reset it', () => {
    const hands = new Hands();
    expect(hands.input('S3', 'switch', 'down', false, false)).toBe('toggle');
    expect(hands.input('S3', 'switch', 'up', false, false)).toBeNull();
    expect(hands.input('S0', 'strike', 'down', false, false)).toBe('press');
    expect(hands.input('S0', 'strike', 'down', false, true)).toBe('toggle');
  });
});
