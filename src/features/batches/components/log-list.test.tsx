// The batch log as shown: every entry worded in full in the brewery's units, dates on entries not from today
// (in the brewery's zone), corrections beside what they correct. The tank names come through the real vessel
// query over a stubbed network (tests/component/network.tsx).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { LogEntry } from '../../../../shared/schemas/batch-log';
import { LogList, entryTime } from './log-list';
import { stubNetwork, withQueries } from '../../../../tests/component/network';
import { KEG_SIZES } from '../../../../shared/brewing';
import { usGalToL, fToC, psiToKpa, flOzToMl } from '../../../../shared/quantities';

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
    render(withQueries(<LogList batchId={1} entries={days} system="metric" timeZone="America/Halifax" />));
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
    render(withQueries(<LogList batchId={1} entries={entries} system="metric" timeZone="America/Halifax" />));
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
      withQueries(
        <LogList
          batchId={1}
          entries={[stepEntry]}
          system="us"
          timeZone="America/Halifax"
          stepAsks={new Map([['pitch-yeast', ['tempC' as const]]])}
        />,
      ),
    );
    fireEvent.click(screen.getByRole('button', { name: 'Correct entry 1' }));
    expect(screen.getByLabelText('Temperature (°F)')).toBeTruthy();
    expect(screen.getByLabelText('Reason')).toBeTruthy();
  });
});

describe('the record words every entry in full, in the brewery’s units', () => {
  const at = (h: number) =>
    `2026-11-${String(20 + Math.floor(h / 24)).padStart(2, '0')}T${String(h % 24).padStart(2, '0')}:00:00Z`;
  const cellar = [
    entry(1, at(0), { kind: 'action', stepKey: 'd_rest', data: { action: 'd_rest', tempC: fToC(72) } }),
    entry(2, at(48), { kind: 'action', stepKey: 'cold_crash', data: { action: 'cold_crash', tempC: fToC(33) } }),
    entry(3, at(50), { kind: 'action', stepKey: 'fining', data: { action: 'fining', detail: 'Gelatin 2 oz' } }),
    entry(4, at(72), {
      kind: 'action',
      stepKey: 'transfer',
      data: { action: 'transfer', volumeL: usGalToL(217), toVesselId: 7 },
    }),
    entry(5, at(74), {
      kind: 'action',
      stepKey: 'carbonation',
      data: { action: 'carbonation', tempC: fToC(34), co2Volumes: 2.5, pressureKpa: psiToKpa(11.2) },
    }),
    entry(6, at(96), {
      kind: 'packaging',
      data: {
        lines: [
          { kind: 'keg', size: 'half_bbl', count: 10 },
          { kind: 'can', sizeMl: flOzToMl(16), count: 96 },
        ],
        final: true,
      },
    }),
  ];

  it('shows each cellar action’s temperature, agent, volume and tank, carbonation and packaging counts in US units', async () => {
    stubNetwork({ 'GET /api/vessels': { status: 200, body: [{ id: 7, name: 'BT-2', type: 'bright_tank' }] } });
    render(withQueries(<LogList batchId={1} entries={cellar} system="us" timeZone="America/Chicago" />));
    const rows = () => screen.getAllByTestId('log-entry').map((li) => li.textContent ?? '');
    // 72 °F and 33 °F as typed (°F = °C × 1.8 + 32, NIST SP 811)
    expect(rows()[0]).toContain('D-rest started');
    expect(rows()[0]).toContain('D-rest started · 72.0 °F');
    expect(rows()[1]).toContain('Cold crash · 33.0 °F');
    expect(rows()[2]).toContain('Gelatin 2 oz');
    // 217 gal = 7.0 bbl of 31 gal (27 CFR 25.11)
    expect(rows()[3]).toContain('7.0 bbl');
    await waitFor(() => expect(rows()[3]).toContain('into BT-2'));
    expect(rows()[4]).toContain('2.50 volumes CO₂');
    expect(rows()[4]).toContain('head pressure 11.2 psi');
    expect(rows()[5]).toContain('10 × ½ bbl keg (5.0 bbl)');
    expect(rows()[5]).toContain('96 × 16 fl oz can (12.0 gal)');
    expect(rows()[5]).toContain(`${(5 + 12 / 31).toFixed(1)} bbl packaged`);
    expect(KEG_SIZES.half_bbl).toBeCloseTo(usGalToL(15.5), 9);
    for (const row of rows()) expect(row).not.toMatch(/°C|\d L\b|kPa|\bmL\b/);
    // author, device and both times on every entry
    expect(rows()[0]).toMatch(/Ilya Brandt · Assistant brewer · observed .* · received .* · device tablet-1/);
  });

  it('orders by time observed, arrival order on request, and keeps a correction beside what it corrects', () => {
    stubNetwork({});
    const entries = [
      entry(1, at(30), { kind: 'reading', data: { sg: 1.02, tempC: 19 }, correctedByIds: [3] }),
      entry(2, at(10), { kind: 'reading', data: { sg: 1.03, tempC: 19 } }), // typed later, observed earlier
      entry(3, at(40), {
        kind: 'correction',
        correctsEntryId: 1,
        reason: 'Misread',
        data: { measurements: { gravitySg: 1.021 } },
      }),
      entry(4, at(35), { kind: 'reading', data: { sg: 1.019, tempC: 19 } }),
    ];
    render(withQueries(<LogList batchId={1} entries={entries} system="us" timeZone="America/Chicago" />));
    const numbers = () => screen.getAllByTestId('entry-number').map((n) => n.textContent);
    expect(numbers()).toEqual(['#2', '#1', '#3', '#4']);
    fireEvent.click(screen.getByRole('button', { name: 'By arrival' }));
    expect(numbers()).toEqual(['#1', '#3', '#2', '#4']);
  });
});
