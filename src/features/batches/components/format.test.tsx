// Dates in the brewery's time zone, not the device's or UTC.
import { describe, expect, it } from 'vitest';
import { dateIn, todayIn } from './format';

describe('dates in the brewery’s zone', () => {
  it('gives Halifax’s date after 8 pm local, when UTC has moved on (America/Halifax is UTC−4 in winter, IANA tz database)', () => {
    expect(todayIn('America/Halifax', new Date('2026-12-02T00:30:00Z'))).toBe('2026-12-01');
    expect(todayIn('America/Halifax', new Date('2026-12-02T04:30:00Z'))).toBe('2026-12-02');
    expect(dateIn('2026-12-02T00:30:00Z', 'UTC')).toBe('2026-12-02');
  });
});
