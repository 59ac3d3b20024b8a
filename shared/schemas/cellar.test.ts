// Gravity readings come in SG (a hydrometer or probe) or °Brix (a refractometer), in the quantities table's limits.
import { describe, expect, it } from 'vitest';
import { readingEntrySchema } from './cellar';
import { issueMessage } from '../quantities/field';

const reading = (body: object) => readingEntrySchema.safeParse({ kind: 'reading', ...body });
const messageAt = (r: ReturnType<typeof reading>, field: string, system: 'us' | 'metric' = 'metric') => {
  const issue = r.success ? undefined : r.error.issues.find((i) => i.path[0] === field);
  return issue && issueMessage(issue, system);
};

describe('reading gravity limits', () => {
  it('keeps a specific gravity within 0.980–1.200, said the same in either system', () => {
    expect(messageAt(reading({ method: 'hydrometer', sg: 1.3 }), 'sg')).toBe('Gravity must be at most 1.200 SG');
    expect(messageAt(reading({ method: 'hydrometer', sg: 1015 }), 'sg', 'us')).toBe('Gravity must be at most 1.200 SG');
    expect(reading({ method: 'hydrometer', sg: 1.015 }).success).toBe(true);
  });

  it('takes °Brix from a refractometer only, and SG from the other instruments only', () => {
    expect(reading({ method: 'refractometer', brix: 8.2, originalBrix: 13.5 }).success).toBe(true);
    expect(messageAt(reading({ method: 'refractometer', brix: 41 }), 'brix')).toBe('Gravity must be at most 40 °Bx');
    expect(messageAt(reading({ method: 'refractometer', sg: 1.05 }), 'sg')).toMatch(/°Brix/);
    expect(messageAt(reading({ method: 'hydrometer', brix: 8 }), 'brix')).toMatch(/specific gravity/);
  });

  it('words a cellar temperature limit in °F for a US brewery (45 °C = 113 °F, NIST SP 811 §B.9)', () => {
    expect(messageAt(reading({ method: 'hydrometer', sg: 1.02, tempC: 60 }), 'tempC', 'us')).toBe(
      'Temperature must be at most 113 °F',
    );
  });
});
