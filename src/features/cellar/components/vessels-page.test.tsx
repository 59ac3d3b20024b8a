// Marking a vessel clean: the caustic and acid cautions come before the record, and a double tap records once.
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, render, screen, within } from '@testing-library/react';
import type { VesselView } from '../../../../shared/schemas/cellar';

const markClean = vi.fn<(id: number) => Promise<void>>();
const tank: VesselView = {
  id: 3,
  name: 'FV-2',
  type: 'fermenter',
  capacityL: 1173,
  ratedPressureKpa: 103,
  status: 'needs_cleaning',
  currentBatchId: null,
};
vi.mock('../../../lib/vessels', () => ({
  useVessels: () => ({ data: [tank], isPending: false, error: null }),
  useSaveVessel: () => ({}),
}));
vi.mock('../api/vessel-state', () => ({
  useMarkClean: () => ({ mutateAsync: markClean }),
  useDeleteVessel: () => ({}),
}));
vi.mock('../../../lib/current-user', async () => {
  const { can } = await import('../../../../shared/policy');
  return {
    useCurrentUser: () => ({ role: 'assistant_brewer', brewery: { unitSystem: 'us', timeZone: 'America/Chicago' } }),
    useCan: (action: Parameters<typeof can>[1]) => can('assistant_brewer', action),
  };
});
vi.mock('react-router-dom', () => ({ Link: (p: { children: unknown }) => p.children }));

const { VesselsPage } = await import('./vessels-page');

/** jsdom has no showModal: the <dialog> is found by its label, open or not. */
const cleanDialog = () => document.querySelector<HTMLElement>('dialog[aria-label="Clean FV-2"]')!;

describe('marking a vessel clean', () => {
  beforeEach(() => {
    markClean.mockReset();
  });

  it('shows the cleaning-chemical cautions before anything is recorded', () => {
    render(<VesselsPage />);
    fireEvent.click(screen.getByRole('button', { name: 'Mark clean' }));
    expect(markClean).not.toHaveBeenCalled();
    const dialog = cleanDialog();
    const caution = within(dialog).getByRole('note', { hidden: true });
    expect(caution.textContent).toMatch(/eye/i);
    expect(caution.textContent).toMatch(/never water to the concentrate/i);
    expect(caution.textContent).toMatch(/purge CO₂.*before caustic.*collapse/is);
    expect(caution.textContent).toMatch(/safety data sheet.*local rules/i);
  });

  it('records the cleaning once for a double tap', async () => {
    let release = () => undefined as void;
    markClean.mockImplementation(() => new Promise<void>((resolve) => (release = resolve)));
    render(<VesselsPage />);
    fireEvent.click(screen.getByRole('button', { name: 'Mark clean' }));
    const confirm = within(cleanDialog()).getByRole('button', { hidden: true, name: 'FV-2 is clean' });
    act(() => {
      fireEvent.click(confirm);
      confirm.removeAttribute('disabled');
      fireEvent.click(confirm);
    });
    await act(async () => release());
    expect(markClean).toHaveBeenCalledTimes(1);
    expect(markClean).toHaveBeenCalledWith(3);
  });
});
