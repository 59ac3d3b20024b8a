import { PLAUSIBLE_PACKAGING_LOSS } from '../../../../shared/brewing';
import { QUANTITIES, showQuantity } from '../../../../shared/quantities';
import type { BatchCellarView } from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';

/** Packaging volumes side by side in one unit: the brewery's larger volume unit (bbl or hL). */
const volume = (system: UnitSystem, litres: number) =>
  showQuantity('volume', system, litres, { unit: QUANTITIES.volume.units[system][1] });

function SummaryItem({ term, value }: { term: string; value: string }) {
  return (
    <div className="rounded-lg bg-mist-100 p-3">
      <dt className="text-xs font-semibold uppercase text-ink-500">{term}</dt>
      <dd className="text-xl font-semibold tabular-nums">{value}</dd>
    </div>
  );
}

/**
 * What went into the tank packaged from (the bright tank, or the fermenter), what is packaged, what is still
 * in the tank, and, once the last run is logged, the loss against that tank, flagged when implausible.
 */
export function PackagingSummary({
  packaging,
  unitSystem,
}: {
  packaging: BatchCellarView['packaging'];
  unitSystem: UnitSystem;
}) {
  const percent = (f: number) => `${(f * 100).toFixed(1)} %`;
  const limit = PLAUSIBLE_PACKAGING_LOSS[packaging.source];
  return (
    <>
      <dl className="grid grid-cols-3 gap-3 text-center" aria-label="Packaged volume">
        <SummaryItem
          term={packaging.source === 'bright_tank' ? 'Into the bright tank' : 'Into the fermenter'}
          value={volume(unitSystem, packaging.sourceL)}
        />
        <SummaryItem
          term={packaging.complete ? 'Packaged' : 'Packaged so far'}
          value={volume(unitSystem, packaging.packagedL)}
        />
        {packaging.complete ? (
          <SummaryItem
            term="Losses"
            value={
              packaging.lossL === null || packaging.lossFraction === null
                ? '—'
                : `${volume(unitSystem, packaging.lossL)} (${percent(packaging.lossFraction)})`
            }
          />
        ) : (
          // Not a loss yet: until the last run, what is not in packages is still in the tank.
          <SummaryItem term="Still in the tank" value={volume(unitSystem, packaging.notPackagedL)} />
        )}
      </dl>
      {packaging.lossImplausible && (
        <p role="alert" className="rounded-lg border-l-8 border-ember-700 bg-brass-100 p-3">
          A loss of {percent(packaging.lossFraction ?? 0)} is more than the {percent(limit)} a packaging from the{' '}
          {packaging.source === 'bright_tank' ? 'bright tank' : 'fermenter'} usually loses: check the counts, the
          package sizes and the volume that went into the tank, and correct the entry that is wrong.
        </p>
      )}
      {!packaging.complete && packaging.runs.length > 0 && (
        <p className="text-sm text-ink-500">Losses are counted once the last run is logged.</p>
      )}
    </>
  );
}
