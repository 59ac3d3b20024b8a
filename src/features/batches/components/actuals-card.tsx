import type { UnitSystem } from '../../../../shared/schemas/auth';
import type { BatchActuals, PlannedActual } from '../../../../shared/schemas/batches';
import { Card } from '../../../components/ui';
import { show } from '../../../lib/units';
import { showSg } from './format';

/** Planned beside actual: mash temperature, pre-boil gravity and volume, OG, knockout volume, efficiency. */
export function ActualsCard({ actuals, system }: { actuals: BatchActuals; system: UnitSystem }) {
  const rows: [string, PlannedActual, (n: number) => string][] = [
    ['Mash temperature', actuals.mashTempC, (n) => show(system, 'temperature', n)],
    ['Pre-boil gravity', actuals.preBoilGravity, showSg],
    ['Pre-boil volume', actuals.preBoilVolumeL, (n) => show(system, 'volume', n)],
    ['OG', actuals.og, showSg],
    ['Knockout volume', actuals.knockoutVolumeL, (n) => show(system, 'volume', n)],
    ['Brewhouse efficiency', actuals.brewhouseEfficiency, (n) => `${(n * 100).toFixed(1)} %`],
  ];
  return (
    <Card className="p-4">
      <h2 className="text-lg font-bold">Planned and actual</h2>
      <table className="mt-2 w-full text-left">
        <thead>
          <tr className="text-sm text-ink-500">
            <th className="py-1 font-semibold"></th>
            <th className="py-1 font-semibold">Planned</th>
            <th className="py-1 font-semibold">Actual</th>
          </tr>
        </thead>
        <tbody className="tabular-nums">
          {rows.map(([label, value, fmt]) => (
            <tr key={label} className="border-t border-mist-200">
              <th className="py-1 pr-2 font-medium">{label}</th>
              <td className="py-1">{fmt(value.planned)}</td>
              <td className="py-1 font-semibold">{value.actual === null ? '—' : fmt(value.actual)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </Card>
  );
}
