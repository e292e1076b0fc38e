import { describe, expect, it } from 'vitest';
import { parseIsoMs, parseNumberCell, parseStateCell, parseTimeCell, secondsBetween } from '@/lib/field-logs/cells';

describe('cells', () => {
  it.each([
    ['0', 0], ['1', 1], ['false', 0], ['true', 1], ['FALSE', 0], ['True', 1],
    ['off', 0], ['on', 1], ['OFF', 0], ['On', 1], ['low', 0], ['high', 1], ['LOW', 0], [' High ', 1],
  ] as const)('reads the state %j as %d', (cell, value) => {
    expect(parseStateCell(cell)).toBe(value);
  });

  it.each(['2', 'yes', '', '0.0', 'onn'])('refuses the state %j', (cell) => {
    expect(parseStateCell(cell)).toBeNull();
  });

  it('reads numbers with the decimal mark the file uses, and nothing else', () => {
    expect(parseNumberCell('1.25', false)).toBe(1.25);
    expect(parseNumberCell('-3e-2', false)).toBe(-0.03);
    expect(parseNumberCell('.5', false)).toBe(0.5);
    expect(parseNumberCell('1,25', true)).toBe(1.25);
    expect(parseNumberCell('7', true)).toBe(7);
    expect(parseNumberCell('1,25', false)).toBeNull();
    expect(parseNumberCell('1.25', true)).toBeNull();
    expect(parseNumberCell('1.2.3', false)).toBeNull();
    expect(parseNumberCell('abc', false)).toBeNull();
    expect(parseNumberCell('', false)).toBeNull();
  });

  it('reads ISO 8601 date-times with Z, offsets with and without a colon, a space for T, and no zone as UTC', () => {
    const utc = Date.UTC(2026, 10, 28, 14, 3, 12, 250);
    expect(parseIsoMs('2026-11-28T14:03:12.250Z')).toBe(utc);
    expect(parseIsoMs('2026-11-28T15:03:12.250+01:00')).toBe(utc);
    expect(parseIsoMs('2026-11-28T09:33:12.250-04:30')).toBe(utc);
    expect(parseIsoMs('2026-11-28T15:03:12.250+0100')).toBe(utc);
    expect(parseIsoMs('2026-11-28 14:03:12.250')).toBe(utc);
    expect(parseIsoMs('2026-11-28T14:03:12.2505Z')).toBeCloseTo(utc + 0.5, 6);
    expect(parseIsoMs('2026-13-28T14:03:12Z')).toBeNull();
    expect(parseIsoMs('14:03:12')).toBeNull();
  });

  it('gives times in seconds between two cells of each format', () => {
    expect(secondsBetween(parseTimeCell('12,345', 'seconds', true)!, parseTimeCell('12,5', 'seconds', true)!, 'seconds')).toBeCloseTo(0.155, 12);
    expect(secondsBetween(parseTimeCell('1000', 'milliseconds', false)!, parseTimeCell('1250', 'milliseconds', false)!, 'milliseconds')).toBe(0.25);
    expect(secondsBetween(parseTimeCell('2026-11-28T23:59:59.990Z', 'iso8601', false)!, parseTimeCell('2026-11-29T01:00:00.010+01:00', 'iso8601', false)!, 'iso8601')).toBe(0.02);
  });
});
