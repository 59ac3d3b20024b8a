// The editor recomputes from shared/brewing as the brewer types: a hop's weight moves the IBU on screen.
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/react';
import { computeRecipe, ozToG } from '../../../../shared/brewing';
import { equipmentAtVolume, toRecipeInput } from '../../../../shared/schemas/recipes';
import { DEMO_EQUIPMENT, SEASONAL_CONTENT, SEASONAL_NAME } from '../../../../server/seed/recipe-data';
import { RecipeEditor } from './recipe-editor';

const pilot = { id: 1, ...DEMO_EQUIPMENT.pilot };

function renderEditor() {
  render(
    <RecipeEditor
      initial={{
        name: SEASONAL_NAME,
        style: 'Amber',
        description: '',
        status: 'draft',
        changeNote: 'Pilot',
        equipmentProfileId: 1,
        content: SEASONAL_CONTENT,
      }}
      equipment={[pilot]}
      library={[
        {
          id: 9,
          kind: 'hop',
          name: 'Harbour wild hop',
          alphaAcidPct: 8,
          ppg: null,
          colourLovibond: null,
          attenuationPct: null,
          notes: '',
          typical: false,
        },
      ]}
      system="us"
      canEdit
      saveLabel="Save"
      onSave={async () => undefined}
    />,
  );
}

const ibuOnScreen = () => within(screen.getByRole('group', { name: 'IBU' })).getByText(/^\d+\.\d$/).textContent;

describe('recipe editor', () => {
  it("updates the IBU when a hop's weight changes", () => {
    renderEditor();
    const before = computeRecipe(
      toRecipeInput(SEASONAL_NAME, SEASONAL_CONTENT),
      equipmentAtVolume(pilot, SEASONAL_CONTENT.targets.batchVolumeL),
    );
    expect(ibuOnScreen()).toBe(before.ibu.toFixed(1));

    // The brewery works in US units: the bittering hop's weight is typed in ounces.
    const weight = within(screen.getByRole('group', { name: 'Hop 1' })).getByLabelText('Weight (oz)');
    fireEvent.change(weight, { target: { value: '4' } });

    const hops = SEASONAL_CONTENT.hops.map((h, i) => (i === 0 ? { ...h, weightG: ozToG(4) } : h));
    const after = computeRecipe(
      toRecipeInput(SEASONAL_NAME, { ...SEASONAL_CONTENT, hops }),
      equipmentAtVolume(pilot, SEASONAL_CONTENT.targets.batchVolumeL),
    );
    expect(after.ibu).toBeGreaterThan(before.ibu + 5);
    expect(ibuOnScreen()).toBe(after.ibu.toFixed(1));
    expect(within(screen.getByRole('group', { name: 'Hop 1' })).getByLabelText('Hop 1 IBU').textContent).toBe(
      `${after.hops[0]!.ibu.toFixed(1)} IBU`,
    );
  });

  it("fills a hop's alpha acid from the library when its name is picked", () => {
    renderEditor();
    const hop = within(screen.getByRole('group', { name: 'Hop 2' }));
    fireEvent.change(hop.getByLabelText('Variety'), { target: { value: 'Harbour wild hop' } });
    expect(hop.getByLabelText<HTMLInputElement>('Alpha (%)').value).toBe('8');
  });

  it('solves a hop written as a share of the target IBU', () => {
    renderEditor();
    const hop = within(screen.getByRole('group', { name: 'Hop 1' }));
    fireEvent.change(hop.getByLabelText('Amount by'), { target: { value: 'share' } });
    fireEvent.change(hop.getByLabelText('Share of IBU (%)'), { target: { value: '50' } });
    // Half of the 24 IBU target, from Tinseth inverted (shared/brewing/hop-shares.test.ts).
    expect(hop.getByLabelText('Hop 1 IBU').textContent).toBe('12.0 IBU');
    expect(hop.getByLabelText('Hop 1 solved weight').textContent).toMatch(/^= \d+\.\d\d oz$/);
  });

  it('shows a message instead of stale numbers while a field is empty', () => {
    renderEditor();
    fireEvent.change(within(screen.getByRole('group', { name: 'Hop 1' })).getByLabelText('Weight (oz)'), {
      target: { value: '' },
    });
    expect(within(screen.getByRole('group', { name: 'IBU' })).getByText('—')).toBeTruthy();
    expect(screen.getByText(/Some fields need attention/)).toBeTruthy();
  });

  it('takes mash thickness in qt/lb and states a rest limit in °F in a US brewery', async () => {
    renderEditor();
    // 1 qt/lb = 2.086 L/kg (US quart 0.946353 L, pound 0.45359237 kg; NIST SP 811 appendix B).
    const thickness = screen.getByLabelText('Mash thickness (qt/lb)');
    fireEvent.change(thickness, { target: { value: '1.5' } });
    fireEvent.blur(thickness);
    expect((thickness as HTMLInputElement).value).toBe('1.5');

    // The schema allows rests up to 80 °C, which is 176 °F (t/°F = 1.8 t/°C + 32, NIST SP 811 B.9);
    // and mash thickness from 1.5 L/kg, which is 0.72 qt/lb (1 qt = 0.946353 L, 1 lb = 0.45359237 kg, NIST Handbook 44).
    const rest = within(screen.getByRole('group', { name: 'Mash-in rest' })).getByLabelText('Rest (°F)');
    fireEvent.change(rest, { target: { value: '190' } });
    expect(await screen.findByText('Rest temperature must be at most 176 °F')).toBeTruthy();
    fireEvent.change(thickness, { target: { value: '0.5' } });
    expect(await screen.findByText('Mash thickness must be at least 0.72 qt/lb')).toBeTruthy();
  });

  it('restates the dose range in the new unit when the dose unit changes, and names the unit', () => {
    renderEditor();
    const adjunct = within(screen.getByRole('group', { name: 'Adjunct 1' }));
    fireEvent.change(adjunct.getByLabelText('Dosed'), { target: { value: 'kgPerHl' } });
    // 1 lb per US gal = 0.45359237 kg / 3.785411784 L = 11.98 kg per hL (NIST Handbook 44 Appendix C).
    expect(adjunct.getByLabelText<HTMLInputElement>('Low (kg per hL)').value).toBe('4.793');
    expect(adjunct.getByLabelText<HTMLInputElement>('High (kg per hL)').value).toBe('11.98');
    expect(adjunct.getByLabelText<HTMLInputElement>('Dose (kg per hL)').value).toBe('7.19');
    expect(screen.queryByText(/outside its/)).toBeNull();
  });

  it("counts a fruit adjunct's sugar toward OG and ABV, and drops it when its sugar is set to 0", () => {
    renderEditor();
    const ogOnScreen = () => within(screen.getByRole('group', { name: 'OG' })).getByText(/^1\.\d{3}$/).textContent;
    const withFruit = computeRecipe(
      toRecipeInput(SEASONAL_NAME, SEASONAL_CONTENT),
      equipmentAtVolume(pilot, SEASONAL_CONTENT.targets.batchVolumeL),
    );
    expect(ogOnScreen()).toBe(withFruit.og.toFixed(3));
    // Roasted quince at 0.6 lb per US gal, 10 % sugar (typical fruit, from memory) × 46.2 ppg sucrose = 2.8 points.
    const adjunct = within(screen.getByRole('group', { name: 'Adjunct 1' }));
    expect(adjunct.getByLabelText('Prepared adjuncts 1 sugar').textContent).toBe(
      '10 % sugar adds 2.8 points to the OG',
    );
    fireEvent.change(adjunct.getByLabelText('Sugar (% of weight)'), { target: { value: '0' } });
    expect(Number(ogOnScreen())).toBeCloseTo(withFruit.og - 0.0028, 3);
  });

  it('keeps the numbers from the complete rows while a new spice row has no name yet', () => {
    renderEditor();
    const ibuBefore = ibuOnScreen();
    fireEvent.click(screen.getByRole('button', { name: 'Add a spice' }));
    expect(ibuOnScreen()).toBe(ibuBefore);
    expect(within(screen.getByRole('group', { name: 'OG' })).getByText(/^1\.\d{3}$/)).toBeTruthy();
    expect(screen.queryByText(/Some fields need attention/)).toBeNull();
    expect(screen.getByText('Leaving out Spice 2 until it is filled in.')).toBeTruthy();
    // The first spice's amount is still shown against its own row.
    expect(screen.getByLabelText('Spices 1 amount').textContent).not.toBe('');
    expect(screen.getByLabelText('Spices 2 amount').textContent).toBe('');
  });

  it("clears an adjunct's boil minute when it moves to the fermenter", () => {
    renderEditor();
    const adjunct = within(screen.getByRole('group', { name: 'Adjunct 1' }));
    expect(adjunct.getByLabelText<HTMLInputElement>('Minutes left').value).toBe('15');
    fireEvent.change(adjunct.getByLabelText('Goes in'), { target: { value: 'fermenter' } });
    expect(adjunct.queryByLabelText('Minutes left')).toBeNull();
    fireEvent.change(adjunct.getByLabelText('Goes in'), { target: { value: 'boil' } });
    expect(adjunct.getByLabelText<HTMLInputElement>('Minutes left').value).toBe('');
  });

  it('shows a brewhouse-sized batch in barrels beside the gallons typed', () => {
    renderEditor();
    const volume = screen.getByLabelText('Batch into fermenter (gal)');
    expect(screen.queryByText(/= .* bbl/)).toBeNull();
    // 310 US gal = 10 bbl (1 bbl = 31 US gal, 27 CFR 25.11).
    fireEvent.change(volume, { target: { value: '310' } });
    expect(screen.getByText('= 10.0 bbl')).toBeTruthy();
  });
});
