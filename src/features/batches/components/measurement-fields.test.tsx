// Typed measurements to SI, including a refractometer reading's °Brix when a reading is corrected.
import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { refractometerBeerSg } from '../../../../shared/brewing';
import { MeasurementFields, toMeasurements } from './measurement-fields';

// The converter the correction dialog builds for a refractometer reading whose original reading was 13.5 °Bx.
const fromBrix = (brix: number) => refractometerBeerSg(13.5, brix);

describe('measurement fields', () => {
  it('converts °Brix with the reading’s own refractometer correction (Terrill 2011 cubic, see shared/brewing)', () => {
    expect(toMeasurements({ gravitySg: '8,2', tempC: '68' }, 'us', 'brix', fromBrix).measurements).toEqual({
      gravitySg: Number(refractometerBeerSg(13.5, 8.2).toFixed(4)),
      tempC: 20, // 68 °F
    });
  });

  it('refuses °Brix without a refractometer to convert it, and a reading above the original, with a message', () => {
    expect(toMeasurements({ gravitySg: '8.2' }, 'us', 'brix').error).toBe('Gravity: enter SG or °P');
    expect(toMeasurements({ gravitySg: '14' }, 'us', 'brix', fromBrix).error).toMatch(/^Gravity: The current reading cannot be higher than the original reading/);
  });

  it('offers °Bx only when asked to', () => {
    const props = { asks: ['gravitySg' as const], expected: {}, typed: {}, onChange: () => undefined, system: 'us' as const, gravity: 'brix' as const, onGravityUnit: () => undefined };
    const { unmount } = render(<MeasurementFields {...props} brix />);
    expect(within(screen.getByRole('group', { name: 'Gravity unit' })).getAllByRole('button').map((b) => b.textContent)).toEqual(['SG', '°P', '°Bx']);
    expect(screen.getByLabelText('Gravity (°Bx)')).toBeTruthy();
    unmount();
    render(<MeasurementFields {...props} gravity="sg" />);
    expect(within(screen.getByRole('group', { name: 'Gravity unit' })).getAllByRole('button').map((b) => b.textContent)).toEqual(['SG', '°P']);
  });
});
