import { describe, expect, it } from 'vitest';
import { parseProbeCsv, parseProbeTime } from './probe-csv';
import { fToC, platoToSg } from '../../shared/brewing';

const base = { delimiter: ',', gravityUnit: 'sg', tempUnit: 'c', timeZone: 'UTC' } as const;

describe('probe CSV', () => {
  it('reads local times in the chosen zone, across a daylight-saving change (IANA tz database: Halifax UTC−3 in summer, UTC−4 in winter)', () => {
    expect(new Date(parseProbeTime('2026-07-01 12:00', 'America/Halifax')!).toISOString()).toBe(
      '2026-07-01T15:00:00.000Z',
    );
    expect(new Date(parseProbeTime('2026-12-01 12:00', 'America/Halifax')!).toISOString()).toBe(
      '2026-12-01T16:00:00.000Z',
    );
    expect(new Date(parseProbeTime('2026-12-01T12:00:00+01:00', 'America/Halifax')!).toISOString()).toBe(
      '2026-12-01T11:00:00.000Z',
    );
    expect(parseProbeTime('2026-02-30 12:00', 'UTC')).toBeNull();
    expect(parseProbeTime('yesterday', 'UTC')).toBeNull();
  });

  it('skips a header, converts °P and °F, and checks every row', () => {
    const csv =
      'time;gravity;temp\n2026-11-03 08:00;13,0;66.2\n2026-11-03 09:00;abc;66\n2026-11-03 10:00;12.5\n2026-11-03 11:00;12;66\n';
    const { rows } = parseProbeCsv(csv, { ...base, delimiter: ';', gravityUnit: 'plato', tempUnit: 'f' });
    expect(rows.map((r) => r.status)).toEqual(['ok', 'error', 'error', 'ok']);
    expect(rows[0]!.sg).toBeCloseTo(platoToSg(13), 10);
    expect(rows[0]!.tempC).toBeCloseTo(fToC(66.2), 10);
    expect(rows[1]).toMatchObject({ line: 3, error: 'Gravity "abc" is not a number.' });
    expect(rows[2]!.error).toMatch(/Expected 3 columns/);
  });

  it('marks a repeated time as a duplicate', () => {
    const { rows } = parseProbeCsv(
      '2026-11-03 08:00,1.050,19\n2026-11-03 08:00,1.050,19\n2026-11-03 09:00,1.049,19',
      base,
    );
    expect(rows.map((r) => r.status)).toEqual(['ok', 'duplicate', 'ok']);
  });

  it('says when a gravity looks like the wrong unit', () => {
    const { rows } = parseProbeCsv('2026-11-03 08:00,12.5,19', base);
    expect(rows[0]!.error).toMatch(/Is the unit °Plato/);
  });
});
