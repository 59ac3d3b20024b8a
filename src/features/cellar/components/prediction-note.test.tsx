// A prediction whose date has passed is not shown as if it were still ahead.
import { describe, expect, it } from 'vitest';
import { render } from '@testing-library/react';
import type { FermentationPrediction } from '../../../../shared/brewing';
import { PredictionNote } from './prediction-note';

const date = new Intl.DateTimeFormat('en-US', {
  timeZone: 'America/Chicago',
  weekday: 'short',
  month: 'short',
  day: 'numeric',
});
const now = Date.parse('2026-12-02T15:00:00Z');
const prediction = (predictedAt: string): FermentationPrediction => ({
  predictedFg: 1.012,
  predictedAtMs: Date.parse(predictedAt),
  ratePerDay: 0.5,
  at: () => 1.012,
  reaches: () => null,
});
const text = (p: FermentationPrediction, latestSg: number | null) =>
  render(<PredictionNote prediction={p} latestSg={latestSg} nowMs={now} date={date} />).container.textContent;

describe('prediction from the curve', () => {
  it('gives the date while it is ahead', () => {
    expect(text(prediction('2026-12-05T18:00:00Z'), 1.02)).toBe('FG ≈ 1.012 by Sat, Dec 5');
  });

  it('says the batch is overdue, not "by Sun, Nov 22", when the date has passed above the predicted gravity (batch 2026-005)', () => {
    const shown = text(prediction('2026-11-22T18:00:00Z'), 1.02);
    expect(shown).toMatch(/^Overdue for FG ≈ 1\.012/);
    expect(shown).toContain('Expected by Sun, Nov 22, 9 days ago');
    expect(shown).not.toMatch(/^FG ≈ 1\.012 by/);
  });

  it('says the batch is there when the date has passed and the gravity reached it', () => {
    expect(text(prediction('2026-11-22T18:00:00Z'), 1.0125)).toBe('At the predicted FG ≈ 1.012');
  });
});
