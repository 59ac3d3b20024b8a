// The cellar forms on the tablet: one write per tap, and each entry carries only what was typed for it.
// The forms run on their real hooks and the real outbox over a stubbed network (tests/component/network.tsx).
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { CellarPlanView, PackagingSummaryView, ReadingView } from '../../../../shared/schemas/cellar';
import { installMemoryIndexedDb, stubNetwork, withQueries, type Sent } from '../../../../tests/component/network';
import { outbox } from '../../../lib/outbox';
import { ReadingForm } from './reading-form';
import { ActionForm } from './action-form';
import { PackagingForm } from './packaging-form';

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
const brightTank = {
  id: 7,
  name: 'BT-1',
  type: 'bright_tank',
  capacityL: 1000,
  ratedPressureKpa: 207,
  status: 'clean',
  currentBatchId: null,
};

/** A batch of 1,173 L (10 bbl) in the fermenter, nothing packaged yet. */
const nothingPackaged: PackagingSummaryView = {
  runs: [],
  knockoutL: 1173,
  source: 'fermenter',
  sourceL: 1173,
  packagedL: 0,
  complete: false,
  notPackagedL: 1173,
  lossL: null,
  lossFraction: null,
  lossImplausible: false,
};

let sent: Sent[];
/** The entries the outbox delivered to the server, in order. */
const delivered = (kind: 'readings' | 'actions' | 'packaging') =>
  sent.filter((r) => r.method === 'POST' && r.path === `/api/cellar/batches/1/${kind}`).map((r) => r.body);

beforeAll(() => {
  installMemoryIndexedDb();
  outbox().setUser({ id: 1, displayName: 'Ilya Brandt' });
});
beforeEach(() => {
  ({ sent } = stubNetwork({
    'GET /api/vessels': { status: 200, body: [brightTank] },
    'POST /api/cellar/batches/1/readings': { status: 201, body: {} },
    'POST /api/cellar/batches/1/actions': { status: 201, body: {} },
    'POST /api/cellar/batches/1/packaging': { status: 201, body: {} },
  }));
});

/** Two taps before React has re-rendered: two submit events in the same task. */
function doubleTap(form: HTMLElement) {
  act(() => {
    fireEvent.submit(form);
    fireEvent.submit(form);
  });
}
/** Lets the outbox finish sending, then counts again: a second write would have landed by now. */
const settle = () => act(() => new Promise((r) => setTimeout(r, 50)));
const type = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
const valueOf = (label: string) => screen.getByLabelText<HTMLInputElement>(label).value;

describe('cellar forms take one tap at a time', () => {
  it('a double tap on Save reading writes one reading', async () => {
    render(withQueries(<ReadingForm batchId={1} readings={[]} unitSystem="us" />));
    fireEvent.click(screen.getByRole('button', { name: 'Hydrometer' }));
    type('Gravity (SG)', '1.013');
    doubleTap(screen.getByRole('form', { name: 'Log a reading' }));
    await waitFor(() => expect(delivered('readings')).toHaveLength(1));
    await settle();
    expect(delivered('readings')).toHaveLength(1);
  });

  it('a later tap, after the first write is done, is taken', async () => {
    render(withQueries(<ReadingForm batchId={1} readings={[]} unitSystem="us" />));
    const form = screen.getByRole('form', { name: 'Log a reading' });
    for (const gravity of ['1.013', '1.012']) {
      fireEvent.click(screen.getByRole('button', { name: 'Hydrometer' }));
      type('Gravity (SG)', gravity);
      fireEvent.submit(form);
      await screen.findByText(new RegExp(`Saved on this tablet: Reading ${gravity}`));
    }
    await waitFor(() => expect(delivered('readings')).toHaveLength(2));
  });

  it('a double tap on a cellar action or a transfer writes one entry', async () => {
    render(withQueries(<ActionForm batchId={1} plan={plan} unitSystem="us" />));
    type('What was done', 'transfer');
    type('Volume moved (bbl)', '7');
    await screen.findByRole('option', { name: 'BT-1' });
    type('Into bright tank', '7');
    doubleTap(screen.getByRole('form', { name: 'Log cellar work' }));
    await waitFor(() => expect(delivered('actions')).toHaveLength(1));
    expect(delivered('actions')[0]).toEqual({
      kind: 'action',
      action: 'transfer',
      // Typed as 7 bbl, sent in litres: 1 bbl = 31 US gal = 117.347 765 304 L (27 CFR 25.11, NIST Handbook 44).
      volumeL: expect.closeTo(821.434357128, 6),
      toVesselId: 7,
    });
    await settle();
    expect(delivered('actions')).toHaveLength(1);
  });

  it('a double tap on Log packaging run writes one run', async () => {
    render(withQueries(<PackagingForm batchId={1} packaging={nothingPackaged} unitSystem="us" />));
    type('Count', '5');
    doubleTap(screen.getByRole('form', { name: 'Log a packaging run' }));
    await waitFor(() => expect(delivered('packaging')).toHaveLength(1));
    expect(delivered('packaging')[0]).toEqual({
      kind: 'packaging',
      lines: [{ kind: 'keg', size: 'half_bbl', count: 5 }],
      final: false,
    });
    await settle();
    expect(delivered('packaging')).toHaveLength(1);
    // The next run starts with no count: nothing of this run is carried into it.
    await screen.findByText(/Saved on this tablet: Packaging/);
    expect(valueOf('Count')).toBe('');
    fireEvent.submit(screen.getByRole('form', { name: 'Log a packaging run' }));
    expect(await screen.findByText('Count: enter a whole number')).toBeTruthy();
  });
});

describe('a kept entry leaves its form empty', () => {
  const submit = (name: string) => fireEvent.submit(screen.getByRole('form', { name }));

  it('a dry hop with a note, then a cold crash: the crash carries neither the hops nor the note', async () => {
    render(withQueries(<ActionForm batchId={1} plan={plan} unitSystem="us" />));
    type('What was done', 'dry_hop');
    type('Hops and weight', 'Citra 9 lb');
    type('Note (optional)', 'Second charge');
    submit('Log cellar work');
    await waitFor(() => expect(delivered('actions')).toHaveLength(1));
    expect(delivered('actions')[0]).toEqual({
      kind: 'action',
      action: 'dry_hop',
      detail: 'Citra 9 lb',
      note: 'Second charge',
    });
    await screen.findByText('Saved on this tablet: Dry hop.');
    expect(valueOf('What was done')).toBe('');
    expect(valueOf('Note (optional)')).toBe('');
    expect(screen.queryByLabelText('Hops and weight')).toBeNull();

    type('What was done', 'dry_hop');
    expect(valueOf('Hops and weight')).toBe('');
    type('What was done', 'cold_crash');
    // The plan's crash temperature is offered, not filled in: 1 °C = 33.8 °F (NIST SP 811, °F = 1.8 × °C + 32).
    expect(valueOf('Set temperature (°F)')).toBe('');
    fireEvent.click(screen.getByRole('button', { name: 'Plan: 33.8 °F' }));
    expect(valueOf('Set temperature (°F)')).toBe('33.8');
    submit('Log cellar work');
    await waitFor(() => expect(delivered('actions')).toHaveLength(2));
    // The API takes °C: the plan's 1 °C goes back as it came.
    expect(delivered('actions')[1]).toEqual({ kind: 'action', action: 'cold_crash', tempC: 1 });
  });

  it('what was typed for one kind is dropped when the person switches to another before keeping', async () => {
    render(withQueries(<ActionForm batchId={1} plan={plan} unitSystem="us" />));
    type('What was done', 'fining');
    type('Fining agent and dose', 'Gelatin 60 g');
    type('What was done', 'd_rest');
    type('Set temperature (°F)', '68');
    submit('Log cellar work');
    await waitFor(() => expect(delivered('actions')).toHaveLength(1));
    // 68 °F = 20 °C (NIST SP 811 §B.9).
    expect(delivered('actions')[0]).toEqual({ kind: 'action', action: 'd_rest', tempC: expect.closeTo(20, 9) });
  });

  it('asks what was done rather than assuming it', async () => {
    render(withQueries(<ActionForm batchId={1} plan={plan} unitSystem="us" />));
    type('Note (optional)', 'Looked at it');
    submit('Log cellar work');
    expect(await screen.findByText('Choose what was done')).toBeTruthy();
    await settle();
    expect(delivered('actions')).toEqual([]);
  });

  const reading = (over: Partial<ReadingView>): ReadingView => ({
    id: 1,
    logEntryId: 1,
    corrected: false,
    takenAt: '2026-12-01T10:00:00Z',
    sg: 1.03,
    plato: 7.6,
    enteredValue: 1.03,
    enteredUnit: 'sg',
    tempC: 18,
    ph: null,
    method: 'hydrometer',
    authorName: 'A',
    ...over,
  });

  it('a hand reading after a probe import: the method is chosen, the last temperature only offered', async () => {
    const readings = [
      reading({ id: 1 }),
      reading({ id: 2, method: 'probe', tempC: 17, enteredUnit: 'plato', enteredValue: 6 }),
    ];
    render(withQueries(<ReadingForm batchId={1} readings={readings} unitSystem="us" />));
    const methods = ['Hydrometer', 'Refractometer', 'Logging probe'];
    for (const m of methods) expect(screen.getByRole('button', { name: new RegExp(m) }).ariaPressed).toBe('false');
    expect(screen.getByRole('button', { name: /Hydrometer/ }).textContent).toBe('Hydrometer usual');
    expect(valueOf('Temperature (°F)')).toBe('');
    type('Gravity (SG)', '1.014');
    submit('Log a reading');
    expect(await screen.findByText('Choose how it was measured')).toBeTruthy();
    // The method buttons have no field of their own: the first takes focus, so a phone scrolls the message into view.
    expect(document.activeElement).toBe(screen.getByRole('button', { name: /Hydrometer/ }));
    await settle();
    expect(delivered('readings')).toEqual([]);

    fireEvent.click(screen.getByRole('button', { name: /Hydrometer/ }));
    // 17 °C = 62.6 °F (NIST SP 811, °F = 1.8 × °C + 32): the probe's, the last reading taken.
    fireEvent.click(screen.getByRole('button', { name: 'Last: 62.6 °F' }));
    type('Note (optional)', 'Sample from the racking arm');
    submit('Log a reading');
    await waitFor(() => expect(delivered('readings')).toHaveLength(1));
    expect(delivered('readings')[0]).toEqual({
      kind: 'reading',
      method: 'hydrometer',
      sg: 1.014,
      tempC: 17,
      note: 'Sample from the racking arm',
    });
    await screen.findByText(/Saved on this tablet: Reading 1.014/);
    expect(valueOf('Gravity (SG)')).toBe('');
    expect(valueOf('Temperature (°F)')).toBe('');
    expect(valueOf('Note (optional)')).toBe('');
    for (const m of methods) expect(screen.getByRole('button', { name: new RegExp(m) }).ariaPressed).toBe('false');
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
  const showSummary = (summary: Partial<PackagingSummaryView>) =>
    render(<PackagingForm batchId={1} packaging={{ ...nothingPackaged, runs: [run], ...summary }} unitSystem="us" />);

  it('after a part run shows what is packaged so far and what is still in the tank, not losses', () => {
    // 1,189.5 L = 10.14 bbl knocked out, 293.2 L = 2.50 bbl packaged: 7.64 bbl still in the tank (1 US bbl = 117.348 L, 27 CFR 25.11).
    showSummary({
      knockoutL: 1189.5,
      source: 'fermenter',
      sourceL: 1189.5,
      packagedL: 293.2,
      complete: false,
      notPackagedL: 896.3,
      lossL: null,
      lossFraction: null,
      lossImplausible: false,
    });
    const dl = screen.getByLabelText('Packaged volume');
    expect(dl.textContent).toContain('Packaged so far2.50 bbl');
    expect(dl.textContent).toContain('Still in the tank7.64 bbl');
    expect(dl.textContent).not.toMatch(/Losses/i);
  });

  it('once the batch is packaged shows the losses', () => {
    showSummary({
      knockoutL: 1189.5,
      source: 'fermenter',
      sourceL: 1189.5,
      packagedL: 1100,
      complete: true,
      notPackagedL: 0,
      lossL: 89.5,
      lossFraction: 89.5 / 1189.5,
      lossImplausible: false,
    });
    // 89.5 L = 0.76 bbl (27 CFR 25.11), 89.5 / 1,189.5 = 7.5 % (arithmetic).
    expect(screen.getByLabelText('Packaged volume').textContent).toContain('Losses0.76 bbl (7.5 %)');
  });

  it('measures against the bright tank and warns of an implausible loss', () => {
    // 2,000 L into the bright tank, 960 L packaged: 1,040 L = 8.86 bbl lost, 52.0 % (27 CFR 25.11; arithmetic),
    // above the 10 % a bright tank usually loses (common practice, no source).
    showSummary({
      knockoutL: 2100,
      source: 'bright_tank',
      sourceL: 2000,
      packagedL: 960,
      complete: true,
      notPackagedL: 0,
      lossL: 1040,
      lossFraction: 0.52,
      lossImplausible: true,
    });
    const dl = screen.getByLabelText('Packaged volume');
    expect(dl.textContent).toContain('Into the bright tank17.04 bbl');
    expect(dl.textContent).toContain('Losses8.86 bbl (52.0 %)');
    expect(screen.getByRole('alert').textContent).toMatch(/52\.0 % is more than the 10\.0 %/);
  });

  it('a new line repeats the package of the line above', () => {
    render(withQueries(<PackagingForm batchId={1} packaging={nothingPackaged} unitSystem="us" />));
    fireEvent.change(screen.getAllByLabelText('Size')[0]!, { target: { value: 'sixth_bbl' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add a line' }));
    const sizes = screen.getAllByLabelText<HTMLSelectElement>('Size');
    expect(sizes.map((s) => s.value)).toEqual(['sixth_bbl', 'sixth_bbl']);
    expect((screen.getAllByLabelText('Count')[1] as HTMLInputElement).value).toBe('');
  });
});

describe('reading form numbers', () => {
  it('reads a decimal comma as a decimal point, as the brew-day screen does', async () => {
    render(withQueries(<ReadingForm batchId={1} readings={[]} unitSystem="us" />));
    fireEvent.click(screen.getByRole('button', { name: 'Hydrometer' }));
    fireEvent.change(screen.getByLabelText('Gravity (SG)'), { target: { value: '1,012' } });
    fireEvent.change(screen.getByLabelText('Temperature (°F)'), { target: { value: '66,5' } });
    fireEvent.submit(screen.getByRole('form', { name: 'Log a reading' }));
    await waitFor(() => expect(delivered('readings')).toHaveLength(1));
    // 66.5 °F = 19.17 °C (NIST SP 811 §B.9): the API takes °C.
    expect(delivered('readings')[0]).toMatchObject({ sg: 1.012, tempC: expect.closeTo(19.1667, 4) });
  });

  it('gives the SG limit, not a °P or °Bx one, for "1015" typed in SG', async () => {
    render(withQueries(<ReadingForm batchId={1} readings={[]} unitSystem="us" />));
    fireEvent.click(screen.getByRole('button', { name: 'Hydrometer' }));
    fireEvent.change(screen.getByLabelText('Gravity (SG)'), { target: { value: '1015' } });
    fireEvent.submit(screen.getByRole('form', { name: 'Log a reading' }));
    expect(await screen.findByText('Gravity must be at most 1.200 SG')).toBeTruthy();
    expect(screen.queryByText(/must be at most [\d.]+ °(P|Bx)/)).toBeNull();
    await settle();
    expect(delivered('readings')).toEqual([]);
  });
});
