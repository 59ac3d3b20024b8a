// The batch log as shown: dates on entries not from today (in the brewery's zone).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import type { LogEntry } from '../../../../shared/schemas/batch-log';
import { LogList, entryTime } from './log-list';

const entry = (id: number, capturedAt: string, extra: Partial<LogEntry> = {}): LogEntry => ({
  id,
  batchId: 1,
  sequence: id,
  kind: 'reading',
  stepKey: null,
  data: { sg: 1.02, tempC: 19 },
  correctsEntryId: null,
  reason: null,
  authorId: 1,
  authorRole: 'assistant_brewer',
  authorName: 'Ilya Brandt',
  meaning: 'performed',
  capturedAt,
  receivedAt: capturedAt,
  deviceId: 'tablet-1',
  late: false,
  hash: 'x',
  correctedByIds: [],
  ...extra,
});

afterEach(() => vi.useRealTimers());

describe('log times', () => {
  it('shows the date on entries not from today in the brewery’s zone (America/Halifax is UTC−4 in winter, IANA tz database)', () => {
    const now = new Date('2026-12-01T18:00:00Z'); // 14:00 AST, Dec 1
    expect(entryTime('2026-12-01T16:46:00Z', 'America/Halifax', now)).toBe('12:46 AST');
    expect(entryTime('2026-11-25T16:46:00Z', 'America/Halifax', now)).toBe('Nov 25, 2026, 12:46 AST');
    // 00:30 UTC on Dec 1 is 20:30 AST on Nov 30: yesterday in Halifax.
    expect(entryTime('2026-12-01T00:30:00Z', 'America/Halifax', now)).toBe('Nov 30, 2026, 20:30 AST');
  });

  it('a week of readings at the same hour no longer read alike', () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-12-01T18:00:00Z'));
    const days = [25, 26, 27, 28, 29, 30].map((d, i) => entry(i + 1, `2026-11-${d}T16:46:00Z`));
    render(<LogList batchId={1} entries={days} system="metric" timeZone="America/Halifax" />);
    const shown = screen.getAllByTestId('log-entry').map((li) => li.firstElementChild!.textContent);
    expect(new Set(shown).size).toBe(6);
    expect(shown[0]).toBe('Nov 25, 2026, 12:46 AST');
  });
});

describe('entry numbers and corrections', () => {
  it('shows each entry’s number, so “corrects #1” can be found', () => {
    const entries = [
      entry(1, '2026-12-01T16:46:00Z', {
        kind: 'step',
        stepKey: 'pitch-yeast',
        data: { label: 'Pitch yeast' },
        correctedByIds: [2],
      }),
      entry(2, '2026-12-01T16:50:00Z', {
        kind: 'correction',
        correctsEntryId: 1,
        reason: 'Forgot the temperature',
        data: { measurements: { tempC: 18 } },
      }),
    ];
    render(<LogList batchId={1} entries={entries} system="metric" timeZone="America/Halifax" />);
    expect(screen.getAllByTestId('entry-number').map((n) => n.textContent)).toEqual(['#1', '#2']);
    expect(screen.getByText('corrects #1')).toBeTruthy();
  });

  it('lets a correction of a step logged without values add the values the step asks for', () => {
    const stepEntry = entry(1, '2026-12-01T16:46:00Z', {
      kind: 'step',
      stepKey: 'pitch-yeast',
      data: { label: 'Pitch yeast' },
    });
    render(
      <LogList
        batchId={1}
        entries={[stepEntry]}
        system="us"
        timeZone="America/Halifax"
        stepAsks={new Map([['pitch-yeast', ['tempC' as const]]])}
      />,
    );
    fireEvent.click(screen.getByRole('button', { name: 'Correct entry 1' }));
    expect(screen.getByLabelText('Temperature (°F)')).toBeTruthy();
    expect(screen.getByLabelText('Reason')).toBeTruthy();
  });
});
