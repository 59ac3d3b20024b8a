// The cellar plan: the head brewer edits it; anyone else reads it as text, told so first.
import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/react';
import type { CellarPlanView } from '../../../../shared/schemas/cellar';
import { withQueries } from '../../../../tests/component/network';
import { PlanForm } from './plan-form';

const plan: CellarPlanView = {
  saved: true,
  plannedFg: 1.012,
  primaryTempC: 19,
  dRestPoints: 3,
  dRestTempC: 21,
  crashTempC: 1,
  co2Volumes: 2.5,
  readingIntervalHours: 24,
};

describe('cellar plan', () => {
  it('shows the assistant the plan as text, with the read-only note first and no fields', () => {
    const { container } = render(withQueries(<PlanForm batchId={1} plan={plan} unitSystem="us" canEdit={false} />));
    expect(container.querySelectorAll('input')).toHaveLength(0);
    expect(screen.queryByRole('button')).toBeNull();
    expect(container.firstElementChild!.firstElementChild!.textContent).toMatch(
      /^Read only: a head brewer changes the plan/,
    );
    const text = screen.getByLabelText('Cellar plan').textContent;
    expect(text).toContain('Planned FG1.012');
    expect(text).toContain('Primary66.2 °F'); // 19 °C = 66.2 °F (t/°F = 1.8 t/°C + 32, NIST SP 811 B.9)
    expect(text).toContain('starts at 1.015'); // FG 1.012 + the 3-point D-rest default (common practice, no source)
  });

  it('gives the head brewer fields and a save button', () => {
    render(withQueries(<PlanForm batchId={1} plan={plan} unitSystem="us" canEdit />));
    expect(screen.getByLabelText<HTMLInputElement>('Planned FG').disabled).toBe(false);
    expect(screen.getByRole('button', { name: 'Save cellar plan' })).toBeTruthy();
  });
});
