import type { TimeFormat } from './types';

/** How a cell spells a state, lower case (logic analysers, PLC exports and loggers use each of these). */
const STATE_SPELLINGS: Readonly<Record<string, 0 | 1>> = { '0': 0, '1': 1, false: 0, true: 1, off: 0, on: 1, low: 0, high: 1 };

/** 0 or 1, or null when the cell is not one of the accepted spellings. */
export function parseStateCell(cell: string): 0 | 1 | null {
  return STATE_SPELLINGS[cell.trim().toLowerCase()] ?? null;
}

const POINT_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
const COMMA_NUMBER = /^[+-]?(\d+,?\d*|,\d+)(e[+-]?\d+)?$/i;

/** A decimal number written with a point, or with a comma when the file uses decimal commas; null otherwise. */
export function parseNumberCell(cell: string, decimalComma: boolean): number | null {
  const text = cell.trim();
  if (!(decimalComma ? COMMA_NUMBER : POINT_NUMBER).test(text)) return null;
  return Number(decimalComma ? text.replace(',', '.') : text);
}

/** `1,25`: a number only a decimal comma makes sense of. */
export function looksLikeCommaNumber(cell: string): boolean {
  return /^[+-]?\d*,\d+$/.test(cell.trim());
}

/** `1.25`: a number with a decimal point. */
export function looksLikePointNumber(cell: string): boolean {
  return /^[+-]?\d*\.\d+$/.test(cell.trim());
}

const ISO_DATE_TIME = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2}):(\d{2})(?:[.,](\d{1,9}))?(z|[+-]\d{2}(?::?\d{2})?)?$/i;

/**
 * Milliseconds since 1970 of an ISO 8601 date-time (`2026-11-28T14:03:12.250Z`, `…+01:00`, or a
 * space for the T), or null. A time without an offset is read as UTC: only differences matter.
 */
export function parseIsoMs(cell: string): number | null {
  const m = ISO_DATE_TIME.exec(cell.trim());
  if (!m) return null;
  const [year, month, day, hour, minute, second] = m.slice(1, 7).map(Number) as [number, number, number, number, number, number];
  if (month < 1 || month > 12 || day < 1 || day > 31 || hour > 23 || minute > 59 || second > 60) return null;
  const fractionMs = m[7] ? Number(`0.${m[7]}`) * 1000 : 0;
  const zone = m[8]?.toLowerCase();
  let offsetMin = 0;
  if (zone && zone !== 'z') {
    const digits = zone.slice(1).replace(':', '');
    offsetMin = (zone.startsWith('-') ? -1 : 1) * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2) || 0));
  }
  return Date.UTC(year, month - 1, day, hour, minute, second) + fractionMs - offsetMin * 60_000;
}

/**
 * A timestamp as a number in the format's own unit (s, ms, or ms since 1970 for ISO 8601), or null.
 * Differences of these, through `secondsBetween`, give times relative to the first row.
 */
export function parseTimeCell(cell: string, format: TimeFormat, decimalComma: boolean): number | null {
  return format === 'iso8601' ? parseIsoMs(cell) : parseNumberCell(cell, decimalComma);
}

export function secondsBetween(from: number, to: number, format: TimeFormat): number {
  return format === 'seconds' ? to - from : (to - from) / 1000;
}
