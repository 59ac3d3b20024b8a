import { describe, expect, it } from 'vitest';
import {
  QUANTITIES,
  boundShown,
  displayUnit,
  limitMessage,
  showQuantity,
  showVolume,
  unitBySymbol,
  type QuantityId,
} from './index';
import { batchVolumeField, issueMessage, issueRefusal, quantityField } from './field';

const ids = Object.keys(QUANTITIES) as QuantityId[];
const systems = ['us', 'metric'] as const;

describe('the quantities table', () => {
  it('states every limit, in every unit a brewery may use, as a number that converts back inside the limits', () => {
    for (const id of ids) {
      const q = QUANTITIES[id];
      for (const system of systems) {
        for (const u of q.units[system]) {
          const max = u.toSi(boundShown('max', q.max, u));
          const min = u.toSi(boundShown('min', q.min, u));
          const step = u.toSi(10 ** -u.decimals) - u.toSi(0);
          expect(max, `${id} max in ${u.unit}`).toBeLessThanOrEqual(q.max + 1e-9);
          expect(max, `${id} max in ${u.unit}`).toBeGreaterThanOrEqual(q.max - Math.abs(step) - 1e-9);
          expect(min, `${id} min in ${u.unit}`).toBeGreaterThanOrEqual(q.min - 1e-9);
          // Every unit converts there and back without drift.
          expect(u.toSi(u.fromSi(q.max)), `${id} round trip in ${u.unit}`).toBeCloseTo(q.max, 9);
        }
      }
    }
  });

  it('never offers a US brewery a litre, a kilogram or a degree Celsius', () => {
    // The pitch rate's "million cells per mL per °P" is the trade's one unit on both sides (common practice, no source).
    for (const id of ids) {
      for (const u of QUANTITIES[id].units.us) expect(u.unit, id).not.toMatch(/^(L|hL|mL|kg|°C)$|^L\/|\/kg$/);
    }
  });

  it('converts by the published definitions', () => {
    // NIST SP 811 §B.9: t/°F = 1.8·t/°C + 32, so water boils at 212 °F and −10 °C is 14 °F.
    expect(showQuantity('temperature', 'us', 100)).toBe('212.0 °F');
    expect(showQuantity('temperature', 'us', -10)).toBe('14.0 °F');
    // NIST Handbook 44 Appendix C: 1 US gal = 3.785 411 784 L, so 20 000 L = 5283.44 gal.
    expect(displayUnit('volume', 'us').fromSi(20_000)).toBeCloseTo(5283.441, 3);
    // 27 CFR 25.11: 1 barrel = 31 US gal = 117.347 765 304 L.
    expect(unitBySymbol('volume', 'us', 'bbl').toSi(1)).toBeCloseTo(117.347765304, 9);
    // NIST SP 811 Appendix B.8: 1 psi = 6.894 757 kPa.
    expect(displayUnit('pressure', 'us').toSi(1)).toBeCloseTo(6.894757, 6);
    // NIST Handbook 44 Appendix C: 1 lb = 0.453 592 37 kg; 1 oz = 28.349 523 125 g; 1 fl oz = 1/128 gal.
    expect(displayUnit('grainWeight', 'us').toSi(1)).toBe(0.45359237);
    expect(displayUnit('hopWeight', 'us').toSi(1)).toBeCloseTo(28.349523125, 9);
    expect(displayUnit('smallVolume', 'us').toSi(12)).toBeCloseTo(354.88, 2);
    // ASBC Beer-2 polynomial: SG 1.040 ≈ 10.0 °P.
    expect(unitBySymbol('gravity', 'metric', '°P').fromSi(1.04)).toBeCloseTo(9.99, 1);
  });

  it('says a batch volume in gallons or barrels (US) and litres or hectolitres (metric)', () => {
    // 1 bbl = 117.348 L (27 CFR 25.11); 1 gal = 3.785 L (NIST Handbook 44).
    expect(showVolume('us', 117.348 * 3.5)).toBe('3.5 bbl');
    expect(showVolume('us', 37.85)).toBe('10.0 gal');
    expect(showVolume('metric', 1200)).toBe('12.0 hL');
    expect(showVolume('metric', 37.9)).toBe('37.9 L');
  });
});

describe('limit messages', () => {
  it('word a limit in the brewery’s own unit, rounded to a value the field accepts', () => {
    const boil = { quantity: 'temperature', bound: 'max', si: 100, label: 'Temperature' } as const;
    expect(limitMessage(boil, 'us')).toBe('Temperature must be at most 212 °F');
    expect(limitMessage(boil, 'metric')).toBe('Temperature must be at most 100 °C');
    // 20 000 L = 5283.44 gal (NIST Handbook 44): stated as 5283.4, which the field accepts.
    const batch = { quantity: 'volume', bound: 'max', si: 20_000, label: 'Batch volume' } as const;
    expect(limitMessage(batch, 'us')).toBe('Batch volume must be at most 5283.4 gal');
    expect(limitMessage(batch, 'us', unitBySymbol('volume', 'us', 'bbl'))).toBe(
      'Batch volume must be at most 170.43 bbl',
    );
    expect(limitMessage({ quantity: 'ph', bound: 'min', si: 2, label: 'pH' }, 'us')).toBe('pH must be at least 2');
  });
});

describe('quantityField', () => {
  it('refuses with the quantity and the bound as data, and words it for each system', () => {
    const rest = quantityField('temperature', { label: 'Rest temperature', min: 30, max: 80 });
    const result = rest.safeParse(85);
    expect(result.success).toBe(false);
    const issue = result.error!.issues[0]!;
    expect(issueRefusal(issue)).toEqual({ quantity: 'temperature', bound: 'max', si: 80, label: 'Rest temperature' });
    // 80 °C = 176 °F (NIST SP 811 §B.9).
    expect(issueMessage(issue, 'us')).toBe('Rest temperature must be at most 176 °F');
    expect(issueMessage(issue, 'metric')).toBe('Rest temperature must be at most 80 °C');
    expect(rest.safeParse(65).success).toBe(true);
  });

  it('answers every refusal of every quantity to a US brewery without a metric unit', () => {
    for (const id of ids) {
      const q = QUANTITIES[id];
      const field = quantityField(id);
      for (const value of [q.max * 2 + 1, q.min - 1]) {
        const parsed = field.safeParse(value);
        if (parsed.success) continue; // a minimum of 0 has nothing below it worth a message
        const message = issueMessage(parsed.error.issues[0]!, 'us');
        expect(message, id).not.toMatch(/\d (L|hL|mL|kg|°C)\b/);
      }
    }
  });

  it('refuses a field limit wider than its quantity’s', () => {
    expect(() => quantityField('temperature', { max: 500 })).toThrow(/outside/);
  });

  it('keeps the batch volume between 1 L and 20 000 L', () => {
    expect(batchVolumeField().safeParse(0.5).success).toBe(false);
    expect(batchVolumeField().safeParse(20_001).success).toBe(false);
    expect(batchVolumeField().safeParse(1000).success).toBe(true);
  });
});
