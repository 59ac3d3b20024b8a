// The scale table speaks the brewery's units: a US brewery sees mash thickness in qt/lb, as the editor takes it.
import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import { scaleRecipe } from '../../../../shared/brewing';
import { equipmentAtVolume, toRecipeInput } from '../../../../shared/schemas/recipes';
import { DEMO_EQUIPMENT, SEASONAL_CONTENT, SEASONAL_NAME } from '../../../../server/seed/recipe-data';
import { ScaleTable } from './scale-view';

function renderScale(system: 'us' | 'metric') {
  const source = equipmentAtVolume(DEMO_EQUIPMENT.pilot, SEASONAL_CONTENT.targets.batchVolumeL);
  const target = DEMO_EQUIPMENT.big;
  const scaled = scaleRecipe(toRecipeInput(SEASONAL_NAME, SEASONAL_CONTENT), source, target);
  render(
    <ScaleTable
      system={system}
      data={{
        recipe: { id: 1, name: SEASONAL_NAME, style: '' },
        version: { id: 1, number: 1, frozen: false, content: SEASONAL_CONTENT },
        source: { equipmentProfileId: 1, equipment: source },
        target: { equipmentProfileId: 2, equipment: target },
        scaled,
      }}
    />,
  );
}

describe('scale table', () => {
  it('states the mash thickness in qt/lb and temperatures in °F in a US brewery', () => {
    renderScale('us');
    const strike = screen.getByText('Strike temperature').closest('tr')!;
    // Pilot 3.00 L/kg and 10 bbl 2.80 L/kg: 1 qt/lb = 2.086 L/kg (NIST SP 811 appendix B), so 1.44 and 1.34 qt/lb.
    expect(within(strike).getByText('mash thickness 1.34 qt/lb (was 1.44 qt/lb)')).toBeTruthy();
    expect(strike.textContent).toMatch(/°F/);
    expect(strike.textContent).not.toMatch(/L\/kg|°C/);
  });

  it('keeps L/kg for a metric brewery', () => {
    renderScale('metric');
    const strike = screen.getByText('Strike temperature').closest('tr')!;
    expect(within(strike).getByText('mash thickness 2.80 L/kg (was 3.00 L/kg)')).toBeTruthy();
  });
});
