import { describe, expect, it } from 'vitest';
import { formatDateTime, formatDay } from '../../shared/dates';

describe('one way to write dates, on the mill clock', () => {
  it('writes a calendar day the same wherever it is read', () => {
    expect(formatDay('2026-12-03')).toBe('Thu 3 Dec 2026');
    expect(formatDay('2024-02-29', 'Pacific/Auckland')).toBe('Thu 29 Feb 2024');
  });

  it('reads an instant on the mill clock, so late evening at the mill is still that day', () => {
    // 03:30 UTC on 4 Dec is 21:30 on 3 Dec in America/Chicago (UTC−6 in winter).
    expect(formatDateTime('2026-12-04T03:30:00Z', 'America/Chicago')).toBe('Thu 3 Dec 2026, 21:30');
    expect(formatDay('2026-12-04T03:30:00Z', 'America/Chicago')).toBe('Thu 3 Dec 2026');
    expect(formatDateTime('2026-12-04T03:30:00Z', 'UTC')).toBe('Fri 4 Dec 2026, 03:30');
  });

  it('follows daylight saving at the mill', () => {
    // 15:00 UTC in July is 10:00 in Chicago (UTC−5, daylight time).
    expect(formatDateTime('2026-07-01T15:00:00Z', 'America/Chicago')).toBe('Wed 1 Jul 2026, 10:00');
  });

  it('says so plainly when a date cannot be read', () => {
    expect(formatDateTime('not a date')).toBe('unknown time');
  });
});
