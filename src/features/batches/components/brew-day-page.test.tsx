// The step list keeps when a step was first done: "Log again" adds entries but never moves that time.
import { describe, expect, it } from 'vitest';
import { doneSteps } from './brew-day-page';

describe('done steps', () => {
  it('keeps the first time a step was done and counts the times it was logged', () => {
    const entries = [
      { kind: 'step', stepKey: 'pitch-yeast', capturedAt: '2026-12-01T16:00:00Z' },
      { kind: 'note', stepKey: null, capturedAt: '2026-12-01T16:05:00Z' },
      { kind: 'step', stepKey: 'pitch-yeast', capturedAt: '2026-12-01T16:10:00Z' },
    ];
    const waiting = [
      {
        idempotencyKey: 'k',
        url: '',
        body: { kind: 'step', stepKey: 'pitch-yeast' },
        capturedAt: '2026-12-01T16:20:00Z',
        label: '',
        group: '',
        userId: 1,
        authorName: '',
        state: 'waiting' as const,
        attempts: 0,
      },
    ];
    expect(doneSteps(entries, waiting).get('pitch-yeast')).toEqual({
      at: '2026-12-01T16:00:00Z',
      waiting: false,
      times: 3,
    });
  });
});
