import { describe, expect, it } from 'vitest';
import { usBblToL } from '../quantities';
import { tooSmall, tooSmallMessage } from './fermenter';

describe('fermenter size', () => {
  it('refuses a tank smaller than the volume run into it, and says both in the brewery’s units', () => {
    // 1 US bbl = 31 US gal = 117.348 L (27 CFR 25.11; DOMAIN.md).
    expect(tooSmall(usBblToL(3.5), usBblToL(10))).toBe(true);
    expect(tooSmall(usBblToL(10), usBblToL(10))).toBe(false);
    expect(tooSmallMessage('us', 'FV-4', usBblToL(3.5), usBblToL(10))).toBe(
      'FV-4 holds 3.5 bbl, but this batch runs 10.0 bbl into the fermenter at knockout. Choose a larger fermenter.',
    );
  });
});
