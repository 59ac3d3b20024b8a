// Typed measurements to SI, including a refractometer reading's °Brix when a reading is corrected.
import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { refractometerBeerSg } from '../../../../shared/brewing';
import { MeasurementFields, refusalOf, toMeasurements } from './measurement-fields';

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
    expect(toMeasurements({ gravitySg: '14' }, 'us', 'brix', fromBrix).error).toMatch(
      /^Gravity: The current reading cannot be higher than the original reading/,
    );
  });

  it('offers °Bx only when asked to', () => {
    const props = {
      asks: ['gravitySg' as const],
      expected: {},
      typed: {},
      onChange: () => undefined,
      system: 'us' as const,
      gravity: 'brix' as const,
      onGravityUnit: () => undefined,
    };
    const { unmount } = render(<MeasurementFields {...props} brix />);
    expect(
      within(screen.getByRole('group', { name: 'Gravity unit' }))
        .getAllByRole('button')
        .map((b) => b.textContent),
    ).toEqual(['SG', '°P', '°Bx']);
    expect(screen.getByLabelText('Gravity (°Bx)')).toBeTruthy();
    unmount();
    render(<MeasurementFields {...props} gravity="sg" />);
    expect(
      within(screen.getByRole('group', { name: 'Gravity unit' }))
        .getAllByRole('button')
        .map((b) => b.textContent),
    ).toEqual(['SG', '°P']);
  });

  it('refuses a value outside the shared schema’s limits, naming the field and the limit in the units it shows', () => {
    // 110 °C is the schema's highest temperature: 230 °F (°F = °C × 9/5 + 32, NIST SP 811 appendix B.9).
    expect(toMeasurements({ tempC: '1674', volumeL: '96' }, 'us', 'sg')).toEqual({
      error: 'Temperature must be at most 230 °F',
      field: 'tempC',
    });
    expect(toMeasurements({ tempC: '1674' }, 'metric', 'sg')).toEqual({
      error: 'Temperature must be at most 110 °C',
      field: 'tempC',
    });
    expect(toMeasurements({ gravitySg: '1.52' }, 'us', 'sg')).toEqual({
      error: 'Gravity must be at most 1.200 SG',
      field: 'gravitySg',
    });
    expect(toMeasurements({ ph: '54' }, 'us', 'sg')).toEqual({ error: 'pH must be at most 10', field: 'ph' });
    expect(toMeasurements({ tempC: '165.5' }, 'us', 'sg').error).toBeUndefined();
  });

  it('warns, without refusing, when a value is far from the step’s expected value', () => {
    const props = {
      asks: ['tempC' as const],
      expected: { tempC: 74 },
      onChange: () => undefined,
      system: 'us' as const,
      gravity: 'sg' as const,
      onGravityUnit: () => undefined,
    };
    const { rerender } = render(<MeasurementFields {...props} typed={{ tempC: '165.5' }} />);
    expect(screen.queryByText(/Far from the expected/)).toBeNull();
    // 74 °C = 165.2 °F (t/°F = 1.8 t/°C + 32, NIST SP 811 B.9); 146.5 °F is about 10 °C below, past the 3 °C the screen lets pass without a word (common practice, no source).
    rerender(<MeasurementFields {...props} typed={{ tempC: '146.5' }} />);
    expect(screen.getByText(/Far from the expected/).textContent).toBe(
      'Far from the expected 165.2 °F: check it before marking done.',
    );
    expect(toMeasurements({ tempC: '146.5' }, 'us', 'sg').error).toBeUndefined();
  });

  it('names the field and limit when the server refused an entry, else passes the server’s message on', () => {
    expect(
      refusalOf(
        { body: { kind: 'step', measurements: { tempC: 912.22 } }, message: 'Some fields need attention' },
        'us',
        'sg',
      ),
    ).toEqual({
      message: 'Temperature must be at most 230 °F',
      field: 'tempC',
    });
    expect(
      refusalOf(
        {
          body: { kind: 'step' },
          message: 'The captured time is in the future: check the tablet’s clock. Nothing was saved.',
        },
        'us',
        'sg',
      ).message,
    ).toBe('The captured time is in the future: check the tablet’s clock. Nothing was saved');
  });
});
