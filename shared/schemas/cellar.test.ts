// Gravity readings are checked against the limits of the unit they were typed in.
import { describe, expect, it } from 'vitest';
import { readingEntrySchema } from './cellar';

const reading = (
  gravity: number,
  gravityUnit: 'sg' | 'plato' | 'brix',
  method: 'hydrometer' | 'refractometer' = 'hydrometer',
) => readingEntrySchema.safeParse({ kind: 'reading', method, gravity, gravityUnit, tempUnit: 'f' });
const gravityMessage = (r: ReturnType<typeof reading>) =>
  r.success ? null : r.error.issues.find((i) => i.path[0] === 'gravity')?.message;

describe('reading gravity limits', () => {
  it('gives the SG range, and the reading probably meant, for a gravity typed as points in SG', () => {
    expect(gravityMessage(reading(1015, 'sg'))).toBe(
      'A specific gravity is between 0.980 and 1.200: did you mean 1.015?',
    );
    expect(gravityMessage(reading(1.3, 'sg'))).toBe('A specific gravity is between 0.980 and 1.200');
    expect(gravityMessage(reading(50, 'sg'))).toBe('A specific gravity is between 0.980 and 1.200');
    expect(reading(1.015, 'sg').success).toBe(true);
  });

  it('gives the °P and °Bx limits in their own units', () => {
    expect(gravityMessage(reading(36, 'plato'))).toBe('Gravity must be at most 35 °P');
    expect(reading(12, 'plato').success).toBe(true);
    expect(gravityMessage(reading(41, 'brix', 'refractometer'))).toBe('Gravity must be at most 40 °Bx');
    expect(reading(8.2, 'brix', 'refractometer').success).toBe(true);
  });
});
