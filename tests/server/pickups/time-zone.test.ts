import { describe, expect, it } from 'vitest';
import { buildSlots, millDay, windowStart } from '../../../server/modules/pickups/slot-calendar';
import { readEnv } from '../../../server/env';

describe('the mill clock', () => {
  it('turns a window\'s wall time into the right instant, winter and summer (daylight saving)', () => {
    expect(windowStart('2026-12-03', '15:00', 'America/Chicago').toISOString()).toBe('2026-12-03T21:00:00.000Z');
    expect(windowStart('2026-07-02', '15:00', 'America/Chicago').toISOString()).toBe('2026-07-02T20:00:00.000Z');
    expect(windowStart('2026-07-02', '09:30', 'Europe/Berlin').toISOString()).toBe('2026-07-02T07:30:00.000Z');
    expect(windowStart('2026-12-03', '15:00', 'UTC').toISOString()).toBe('2026-12-03T15:00:00.000Z');
  });

  it('knows the mill\'s date when UTC has already moved to the next day', () => {
    const lateEvening = new Date('2026-12-03T03:30:00Z'); // 21:30 on 2 Dec in Chicago
    expect(millDay(lateEvening, 'America/Chicago')).toBe('2026-12-02');
    expect(millDay(lateEvening, 'UTC')).toBe('2026-12-03');
  });

  it('keeps a window open until it starts at the mill, not in UTC', () => {
    const windows = [{ id: 1, weekday: 4, startsAt: '15:00', endsAt: '18:00', capacity: 2, active: true }];
    const now = new Date('2026-12-03T16:00:00Z'); // 10:00 in Chicago, 16:00 UTC
    const slots = (tz: string) => {
      process.env.MILL_TIME_ZONE = tz;
      try { return buildSlots({ windows, closed: new Set(), booked: new Map(), from: '2026-12-03', days: 1, now }); } finally { delete process.env.MILL_TIME_ZONE; }
    };
    expect(slots('America/Chicago')).toHaveLength(1);
    expect(slots('UTC')).toHaveLength(0);
  });

  it('refuses to start with a time zone that does not exist', () => {
    expect(() => readEnv({ MILL_TIME_ZONE: 'Mars/Olympus' })).toThrow(/MILL_TIME_ZONE/);
  });
});
