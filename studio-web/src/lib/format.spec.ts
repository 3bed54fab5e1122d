import { describe, expect, it } from 'vitest';
import { formatClockTime, formatLatency } from './format';

describe('formatLatency', () => {
  it('writes milliseconds with one decimal and the unit', () => {
    expect(formatLatency(4.2)).toBe('4.2 ms');
    expect(formatLatency(12.34)).toBe('12.3 ms');
    expect(formatLatency(0.04)).toBe('< 0.1 ms');
    expect(formatLatency(2001.5)).toBe('2.00 s');
  });

  it('says "not measured" for a missing or impossible value', () => {
    expect(formatLatency(undefined)).toBe('not measured');
    expect(formatLatency(Number.NaN)).toBe('not measured');
    expect(formatLatency(-1)).toBe('not measured');
  });
});

describe('formatClockTime', () => {
  it('gives hours, minutes and seconds, or says the time is unknown', () => {
    expect(formatClockTime('2030-01-15T10:20:30.000Z')).toMatch(/^\d{2}:\d{2}:30$/);
    expect(formatClockTime('yesterday-ish')).toBe('unknown time');
  });
});
