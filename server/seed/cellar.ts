// The demo brewery's cellar: fermenters and bright tanks, and last week's flagship in FV-1 with a
// reading a day since knockout. Every number is invented.
import { Batch, BatchLogEntry, Vessel } from '../models';
import { assignVessel } from '../services/batches';
import { writeReading } from '../services/readings';
import { cToF, psiToKpa, usBblToL } from '../../shared/brewing';
import type { DemoContext } from './context';

const VESSELS = [
  { name: 'FV-1', type: 'fermenter', bbl: 10, psi: 15 },
  { name: 'FV-2', type: 'fermenter', bbl: 10, psi: 15 },
  { name: 'FV-3', type: 'fermenter', bbl: 20, psi: 15 },
  { name: 'FV-4', type: 'fermenter', bbl: 3.5, psi: 15 },
  { name: 'BT-1', type: 'bright_tank', bbl: 10, psi: 30 },
  { name: 'BT-2', type: 'bright_tank', bbl: 20, psi: 30 },
] as const;

const HOUR_MS = 3_600_000;

export async function seedCellar({ brewery, users, transaction }: DemoContext): Promise<void> {
  const vessels: Vessel[] = [];
  for (const v of VESSELS) {
    vessels.push(
      await Vessel.create(
        {
          breweryId: brewery.id,
          name: v.name,
          type: v.type,
          capacityL: usBblToL(v.bbl),
          ratedPressureKpa: psiToKpa(v.psi),
          status: 'clean',
          currentBatchId: null,
        },
        { transaction },
      ),
    );
  }
  const fermenting = await Batch.findOne({ where: { breweryId: brewery.id, status: 'fermenting' }, transaction });
  if (!fermenting) return;
  await assignVessel(brewery.id, fermenting.id, vessels[0]!.id, transaction);
  const knockout = await BatchLogEntry.findOne({
    where: { batchId: fermenting.id, stepKey: 'knockout-end' },
    transaction,
  });
  const start = knockout ? new Date(knockout.capturedAt).getTime() : Date.now() - 6 * 24 * HOUR_MS;
  const og = fermenting.plannedOg - 0.002;
  const fg = fermenting.plan.computed.fg;
  const assistant = {
    id: users.assistant_brewer.id,
    breweryId: brewery.id,
    role: users.assistant_brewer.role,
    displayName: users.assistant_brewer.displayName,
  };
  // A reading about every 24 h, the last one this morning; the curve falls as a slow ale does.
  for (let hours = 2; start + hours * HOUR_MS < Date.now() - 6 * HOUR_MS; hours += 24) {
    const atMs = start + hours * HOUR_MS;
    const days = hours / 24;
    await writeReading(
      assistant,
      fermenting.id,
      {
        kind: 'reading',
        method: 'hydrometer',
        gravity: Number((fg + (og - fg) * Math.exp(-0.33 * days)).toFixed(3)),
        gravityUnit: 'sg',
        temp: Number(cToF(18.6 + Math.min(1, days / 3) * 0.8).toFixed(1)),
        tempUnit: 'f',
      },
      {
        idempotencyKey: `demo-reading-${fermenting.id}-${hours}`.padEnd(16, '0'),
        capturedAt: new Date(atMs),
        deviceId: 'demo-tablet-1',
      },
      transaction,
    );
  }
}
