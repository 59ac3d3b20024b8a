// The boil timer: the 60 min addition is due at the start of a 60 min boil, and the timer stops at flame-out.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, render, screen } from '@testing-library/react';
import { BoilTimer } from './boil-timer';

const START = Date.parse('2026-12-01T14:00:00Z');
const additions = [
  { minute: 60, additions: [{ what: 'Magnum', amount: { value: 450, unit: 'g' as const } }] },
  { minute: 15, additions: [{ what: 'Cascade', amount: { value: 900, unit: 'g' as const } }] },
];
const props = {
  boilStartedAt: new Date(START).toISOString(),
  boilMinutes: 60,
  additions,
  system: 'metric' as const,
  timeZone: 'America/Halifax',
};

beforeEach(() => {
  vi.useFakeTimers();
  vi.setSystemTime(START + 1000);
});
afterEach(() => vi.useRealTimers());

describe('boil timer', () => {
  it('shows the 60 min addition as due one second into a 60 min boil until it is logged (additions by minutes remaining, DOMAIN.md)', () => {
    const { rerender } = render(<BoilTimer {...props} />);
    expect(screen.queryByText(/No more additions|Every boil addition is logged/)).toBeNull();
    expect(screen.getByTestId('boil-add-now').textContent).toContain('60 min addition');
    expect(screen.getByText('Magnum')).toBeTruthy();
    act(() => {
      vi.advanceTimersByTime(5 * 60_000);
    });
    expect(screen.getByTestId('boil-add-now').textContent).toContain('due 05:01 ago');
    rerender(<BoilTimer {...props} loggedMinutes={new Set([60])} />);
    // 15 min remaining is 45 min after the start: 45:00 − 5:01 = 39:59.
    expect(screen.getByTestId('boil-countdown').textContent).toBe('39:59');
    rerender(<BoilTimer {...props} loggedMinutes={new Set([60, 15])} />);
    expect(screen.getByText('Every boil addition is logged.')).toBeTruthy();
  });

  it('stops at flame-out and shows how long the boil was', () => {
    render(<BoilTimer {...props} boilEndedAt={new Date(START + 62 * 60_000).toISOString()} />);
    act(() => {
      vi.advanceTimersByTime(30 * 60_000);
    });
    expect(screen.getByTestId('boil-ended').textContent).toBe('Boil ended 11:02 AST after 62:00');
    expect(screen.queryByTestId('boil-countdown')).toBeNull();
  });
});
