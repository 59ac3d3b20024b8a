// Chart axes: round, evenly spaced ticks (common practice in chart design, no source).
import { describe, expect, it } from 'vitest';
import { niceAxis } from './chart-ticks';

const evenlySpaced = (ticks: number[]) => new Set(ticks.slice(1).map((t, i) => (t - ticks[i]!).toFixed(9))).size === 1;

describe('nice axis ticks', () => {
  it('gives round gravity ticks for a fermentation from 1.052 to 1.009 (testers saw 1.009/1.024/1.039/1.051)', () => {
    const axis = niceAxis([1.052, 1.031, 1.021, 1.009, 1.012], { pad: 0.002 });
    expect(axis.ticks).toEqual([1, 1.01, 1.02, 1.03, 1.04, 1.05, 1.06]);
    expect(axis.domain).toEqual([1, 1.06]);
    expect(axis.ticks.map((t) => t.toFixed(3))).toContain('1.010');
  });

  it('gives round temperature ticks (testers saw 62/65/68/72)', () => {
    const axis = niceAxis([64, 66, 67.5, 70], { pad: 2, target: 4 });
    expect(axis.ticks).toEqual([60, 65, 70, 75]);
    expect(evenlySpaced(axis.ticks)).toBe(true);
  });

  it('gives round efficiency ticks (testers saw 72/74/76/79)', () => {
    const axis = niceAxis([73.4, 76.1, 77.8, null], { pad: 1, target: 4 });
    expect(axis.ticks).toEqual([72, 74, 76, 78, 80]);
    expect(axis.decimals).toBe(0);
  });

  it('copes with one value and with none', () => {
    const one = niceAxis([1.012]);
    expect(one.ticks.length).toBeGreaterThan(1);
    expect(one.domain[0]).toBeLessThan(1.012);
    expect(one.domain[1]).toBeGreaterThan(1.012);
    expect(evenlySpaced(one.ticks)).toBe(true);
    expect(niceAxis([]).ticks.length).toBeGreaterThan(1);
  });
});
