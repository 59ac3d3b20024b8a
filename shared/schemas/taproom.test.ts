// The taproom's strength bands, judged on the ABV as shown (one decimal). Band edges are common practice, no source.
import { describe, expect, it } from 'vitest';
import { shownAbvPct, strengthOf } from './taproom';

describe('strengthOf', () => {
  it('files a beer by the one-decimal ABV it shows, on either side of each edge', () => {
    expect([4.4449, 4.45, 4.4999, 4.5].map((abv) => [shownAbvPct(abv), strengthOf(abv)])).toEqual([
      [4.4, 'session'],
      [4.5, 'standard'], // 4.45 is held as 4.45000000000000018, shown as 4.5
      [4.5, 'standard'],
      [4.5, 'standard'],
    ]);
    expect([6.449, 6.4951, 6.5].map(strengthOf)).toEqual(['standard', 'strong', 'strong']);
  });

  it('covers the whole range', () => {
    expect([0, 0.04, 12.3, 99.99].map(strengthOf)).toEqual(['session', 'session', 'strong', 'strong']);
  });
});
