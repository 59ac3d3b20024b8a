// The cellar forms on the tablet: one write per tap, however fast the second tap comes.
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { CellarPlanView } from '../../../../shared/schemas/cellar';

const log = vi.fn<(entry: unknown, label: string) => Promise<void>>();
vi.mock('../api/log-cellar-entry', () => ({
  useLogCellarEntry: () => log,
  cellarGroup: (id: number) => `cellar:${id}`,
}));
vi.mock('../api/vessels', () => ({
  useVessels: () => ({
    data: [
      {
        id: 7,
        name: 'BT-1',
        type: 'bright_tank',
        capacityL: 1000,
        ratedPressureKpa: 207,
        status: 'clean',
        currentBatchId: null,
      },
    ],
  }),
}));

const { ReadingForm } = await import('./reading-form');
const { ActionForm } = await import('./action-form');
const { PackagingForm } = await import('./packaging-form');

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

/** A log that stays pending until released: the first tap is still being handled when the second lands. */
function slowLog() {
  let release = () => undefined as void;
  log.mockImplementation(() => new Promise<void>((resolve) => (release = resolve)));
  return () => act(async () => release());
}

/** Two taps before React has re-rendered: two submit events in the same task. */
function doubleTap(form: HTMLElement) {
  act(() => {
    fireEvent.submit(form);
    fireEvent.submit(form);
  });
}

describe('cellar forms take one tap at a time', () => {
  beforeEach(() => {
    log.mockReset();
  });

  it('a double tap on Save reading writes one reading', async () => {
    const release = slowLog();
    render(<ReadingForm batchId={1} readings={[]} unitSystem="us" />);
    fireEvent.change(screen.getByLabelText('Gravity (SG)'), { target: { value: '1.013' } });
    doubleTap(screen.getByRole('form', { name: 'Log a reading' }));
    await waitFor(() => expect(log).toHaveBeenCalledTimes(1));
    await release();
    await new Promise((r) => setTimeout(r, 20));
    expect(log).toHaveBeenCalledTimes(1);
  });

  it('a later tap, after the first write is done, is taken', async () => {
    log.mockResolvedValue(undefined);
    render(<ReadingForm batchId={1} readings={[]} unitSystem="us" />);
    const form = screen.getByRole('form', { name: 'Log a reading' });
    fireEvent.change(screen.getByLabelText('Gravity (SG)'), { target: { value: '1.013' } });
    fireEvent.submit(form);
    await waitFor(() => expect(log).toHaveBeenCalledTimes(1));
    fireEvent.change(screen.getByLabelText('Gravity (SG)'), { target: { value: '1.012' } });
    fireEvent.submit(form);
    await waitFor(() => expect(log).toHaveBeenCalledTimes(2));
  });

  it('a double tap on a cellar action or a transfer writes one entry', async () => {
    const release = slowLog();
    render(<ActionForm batchId={1} plan={plan} unitSystem="us" />);
    fireEvent.change(screen.getByLabelText('What was done'), { target: { value: 'transfer' } });
    fireEvent.change(screen.getByLabelText('Volume moved'), { target: { value: '7' } });
    fireEvent.change(screen.getByLabelText('Into bright tank'), { target: { value: '7' } });
    doubleTap(screen.getByRole('form', { name: 'Log cellar work' }));
    await waitFor(() => expect(log).toHaveBeenCalledTimes(1));
    expect(log.mock.calls[0]![0]).toMatchObject({ action: 'transfer', volume: 7, toVesselId: 7 });
    await release();
    expect(log).toHaveBeenCalledTimes(1);
  });

  it('a double tap on Log packaging run writes one run', async () => {
    const release = slowLog();
    render(
      <PackagingForm
        batchId={1}
        packaging={{
          runs: [],
          knockoutL: 1173,
          packagedL: 0,
          complete: false,
          notPackagedL: 1173,
          lossL: null,
          lossFraction: null,
        }}
        unitSystem="us"
      />,
    );
    doubleTap(screen.getByRole('form', { name: 'Log a packaging run' }));
    await waitFor(() => expect(log).toHaveBeenCalledTimes(1));
    await release();
    expect(log).toHaveBeenCalledTimes(1);
  });
});

describe('packaging summary', () => {
  const run = {
    logEntryId: 1,
    packagedAt: '2026-12-01T10:00:00Z',
    lines: [{ kind: 'keg' as const, size: 'half_bbl', count: 5 }],
    packagedL: 293.2,
    authorName: 'A',
  };

  it('after a part run shows what is packaged so far and what is still in the tank, not losses', () => {
    // 1,189.5 L = 10.14 bbl knocked out, 293.2 L = 2.50 bbl packaged: 7.64 bbl still in the tank (1 US bbl = 117.348 L, 27 CFR 25.11).
    render(
      <PackagingForm
        batchId={1}
        packaging={{
          runs: [run],
          knockoutL: 1189.5,
          packagedL: 293.2,
          complete: false,
          notPackagedL: 896.3,
          lossL: null,
          lossFraction: null,
        }}
        unitSystem="us"
      />,
    );
    const dl = screen.getByLabelText('Packaged volume');
    expect(dl.textContent).toContain('Packaged so far2.50 bbl');
    expect(dl.textContent).toContain('Still in the tank7.64 bbl');
    expect(dl.textContent).not.toMatch(/Losses/i);
  });

  it('once the batch is packaged shows the losses', () => {
    render(
      <PackagingForm
        batchId={1}
        packaging={{
          runs: [run],
          knockoutL: 1189.5,
          packagedL: 1100,
          complete: true,
          notPackagedL: 0,
          lossL: 89.5,
          lossFraction: 89.5 / 1189.5,
        }}
        unitSystem="us"
      />,
    );
    // 89.5 L = 0.76 bbl (27 CFR 25.11), 89.5 / 1,189.5 = 7.5 % (arithmetic).
    expect(screen.getByLabelText('Packaged volume').textContent).toContain('Losses0.76 bbl (7.5 %)');
  });
});

describe('reading form numbers', () => {
  beforeEach(() => {
    log.mockReset();
    log.mockResolvedValue(undefined);
  });

  it('reads a decimal comma as a decimal point, as the brew-day screen does', async () => {
    render(<ReadingForm batchId={1} readings={[]} unitSystem="us" />);
    fireEvent.change(screen.getByLabelText('Gravity (SG)'), { target: { value: '1,012' } });
    fireEvent.change(screen.getByLabelText('Temperature (°F)'), { target: { value: '66,5' } });
    fireEvent.submit(screen.getByRole('form', { name: 'Log a reading' }));
    await waitFor(() => expect(log).toHaveBeenCalledTimes(1));
    expect(log.mock.calls[0]![0]).toMatchObject({ gravity: 1.012, gravityUnit: 'sg', temp: 66.5 });
  });

  it('gives the SG limit, not the °P one, for "1015" typed in SG', async () => {
    render(<ReadingForm batchId={1} readings={[]} unitSystem="us" />);
    fireEvent.change(screen.getByLabelText('Gravity (SG)'), { target: { value: '1015' } });
    fireEvent.submit(screen.getByRole('form', { name: 'Log a reading' }));
    expect(await screen.findByText('A specific gravity is between 0.980 and 1.200: did you mean 1.015?')).toBeTruthy();
    expect(screen.queryByText(/at most 40/)).toBeNull();
    expect(log).not.toHaveBeenCalled();
  });
});
