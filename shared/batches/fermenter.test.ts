import { describe, expect, it } from 'vitest';
import { showVolume, usBblToL } from '../brewing';
import { tooSmall, tooSmallMessage } from './fermenter';

describe('fermenter size', () => {
  it('refuses a tank smaller than the volume run into it, and says both in the brewery’s units', () => {
    // 1 US bbl = 31 US gal = 117.348 L (27 CFR 25.11; DOMAIN.md).
    expect(showVolume('us', 117.348 * 3.5)).toBe('3.5 bbl');
    expect(showVolume('us', 37.85)).toBe('10.0 gal'); // 1 US gal = 3.785411784 L (NIST Handbook 44, Appendix C)
    expect(showVolume('metric', 1200)).toBe('12.0 hL');
    expect(tooSmall(usBblToL(3.5), usBblToL(10))).toBe(true);
    expect(tooSmall(usBblToL(10), usBblToL(10))).toBe(false);
    expect(tooSmallMessage('us', 'FV-4', usBblToL(3.5), usBblToL(10))).toBe(
      'FV-4 holds 3.5 bbl, but this batch runs 10.0 bbl into the fermenter at knockout. Choose a larger fermenter.',
    );
  });
});
