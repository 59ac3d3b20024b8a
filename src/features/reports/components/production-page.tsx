import { useState } from 'react';
import { QUANTITIES, type DisplayUnit, type UnitSystem } from '../../../../shared/quantities';
import { packageName } from '../../../../shared/schemas/cellar';
import type { BeerFigures } from '../../../../shared/schemas/reports';
import {
  Button,
  buttonClass,
  Card,
  EmptyState,
  ErrorState,
  Loading,
  PageHeader,
  Table,
  Td,
  TextField,
  Th,
} from '../../../components/ui';
import { productionCsvUrl, useProductionReport } from '../api/production';
import { useCurrentUser } from '../../../lib/current-user';

const FIGURES = [
  ['brewedL', 'Brewed (knockout)'],
  ['packagedL', 'Packaged'],
  ['dumpedL', 'Dumped'],
  ['inTankL', 'In tanks at month end'],
] as const;

/** Production is counted in the brewery's larger volume unit: US barrels or hectolitres, never both. */
const reportUnit = (system: UnitSystem): DisplayUnit =>
  QUANTITIES.volume.units[system][1] ?? QUANTITIES.volume.units[system][0];
const figure = (u: DisplayUnit, l: number) => u.fromSi(l).toFixed(2);

function lastMonth(): string {
  const d = new Date();
  d.setUTCDate(1);
  d.setUTCMonth(d.getUTCMonth() - 1);
  return d.toISOString().slice(0, 7);
}

function FiguresRow({
  name,
  b,
  unit,
  strong,
}: {
  name: string;
  b: Omit<BeerFigures, 'beerName'>;
  unit: DisplayUnit;
  strong?: boolean;
}) {
  return (
    <tr className={strong ? 'font-bold' : undefined}>
      <Td>{name}</Td>
      {FIGURES.map(([key]) => (
        <Td key={key} className="text-right">
          {figure(unit, b[key])}
        </Td>
      ))}
    </tr>
  );
}

/** The month's production per beer and in total, in the brewery's barrels or hectolitres; CSV and a print-ready page. */
export function ProductionPage() {
  const [month, setMonth] = useState(lastMonth);
  const report = useProductionReport(month);
  const me = useCurrentUser();
  const unit = reportUnit(me.brewery.unitSystem);
  return (
    <div className="space-y-5">
      <PageHeader
        title="Monthly production"
        subtitle={`${me.brewery.name}: volume brewed, packaged, dumped and in tanks, per beer.`}
        actions={
          <div className="flex gap-3 print:hidden">
            <a href={productionCsvUrl(month)} className={buttonClass({ variant: 'secondary' })}>
              Download CSV
            </a>
            <Button variant="secondary" onClick={() => window.print()}>
              Print
            </Button>
          </div>
        }
      />
      <Card className="border-sky-700 bg-sky-100 text-ink-900">
        Official production and excise forms differ by country and by state or province. These figures help you prepare
        them; they are not a filing. Check every figure against your own records before you submit anything.
      </Card>
      <div className="w-56 print:hidden">
        <TextField
          label="Month"
          type="month"
          value={month}
          max={new Date().toISOString().slice(0, 7)}
          onChange={(e) => e.target.value && setMonth(e.target.value)}
        />
      </div>
      {report.isPending ? (
        <Loading label="Adding up the month" />
      ) : report.isError ? (
        <ErrorState error={report.error} onRetry={() => report.refetch()} />
      ) : report.data.beers.length === 0 ? (
        <EmptyState title={`Nothing brewed, packaged or in tanks in ${month}`}>Choose another month.</EmptyState>
      ) : (
        <>
          <p className="text-sm text-ink-500">
            {month}, in the brewery's time zone ({report.data.timeZone}).{' '}
            {unit.unit === 'bbl' ? 'US barrels of 31 gallons.' : 'Hectolitres of 100 litres.'}
          </p>
          <Table>
            <thead>
              <tr>
                <Th>Beer</Th>
                {FIGURES.map(([key, label]) => (
                  <Th key={key} className="text-right">
                    {label} ({unit.unit})
                  </Th>
                ))}
              </tr>
            </thead>
            <tbody>
              {report.data.beers.map((b) => (
                <FiguresRow key={b.beerName} name={b.beerName} b={b} unit={unit} />
              ))}
              <FiguresRow name="Total" b={report.data.totals} unit={unit} strong />
            </tbody>
          </Table>
          <h2 className="pt-2 text-xl font-bold text-ink-900">Packaged by package</h2>
          {report.data.packages.length === 0 ? (
            <p className="text-ink-500">Nothing was packaged this month.</p>
          ) : (
            <Table>
              <thead>
                <tr>
                  <Th>Beer</Th>
                  <Th>Package</Th>
                  <Th className="text-right">Count</Th>
                  <Th className="text-right">{unit.unit}</Th>
                </tr>
              </thead>
              <tbody>
                {report.data.packages.map((p) => (
                  <tr key={`${p.beerName}-${p.kind}-${p.size}`}>
                    <Td>{p.beerName}</Td>
                    <Td>{packageName(me.brewery.unitSystem, p.kind, p.size)}</Td>
                    <Td className="text-right">{p.count}</Td>
                    <Td className="text-right">{figure(unit, p.volumeL)}</Td>
                  </tr>
                ))}
              </tbody>
            </Table>
          )}
        </>
      )}
    </div>
  );
}
