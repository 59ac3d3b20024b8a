import { describe, expect, it } from 'vitest';
import * as u from './convert';

describe('unit constants', () => {
  it('match NIST definitions', () => {
    // NIST Handbook 44 Appendix C: 1 US gal = 231 in³ = 3.785 411 784 L exactly.
    expect(u.usGalToL(1)).toBe(3.785411784);
    // NIST Handbook 44 Appendix C / SP 811 B.8: 1 lb = 0.453 592 37 kg exactly.
    expect(u.lbToKg(1)).toBe(0.45359237);
    // NIST Handbook 44 Appendix C: 1 oz avoirdupois = 28.349 523 125 g.
    expect(u.ozToG(1)).toBeCloseTo(28.349523125, 12);
    // NIST Handbook 44 Appendix C: 1 tsp = 1/6 fl oz = 4.928 921 593 75 mL.
    expect(u.tspToMl(1)).toBeCloseTo(4.92892159375, 12);
    // NIST SP 811 Appendix B.8: 1 psi = 6.894 757 kPa.
    expect(u.psiToKpa(1)).toBeCloseTo(6.894757, 6);
    // 27 CFR 25.11: a barrel is 31 US gal → 117.347 765 304 L.
    expect(u.usBblToL(1)).toBeCloseTo(117.347765304, 9);
  });

  it('converts temperatures per NIST SP 811 §B.9', () => {
    expect(u.fToC(212)).toBeCloseTo(100, 12);
    expect(u.cToF(-40)).toBeCloseTo(-40, 12);
    expect(u.fToC(u.cToF(66.6))).toBeCloseTo(66.6, 12);
  });

  it('round-trips mash thickness (1 qt/lb ≈ 2.086 L/kg, derived from the NIST quart and pound)', () => {
    expect(u.qtPerLbToLPerKg(1)).toBeCloseTo(2.0864, 4);
    expect(u.lPerKgToQtPerLb(u.qtPerLbToLPerKg(1.5))).toBeCloseTo(1.5, 12);
  });
});
