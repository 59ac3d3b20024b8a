import type { UnitSystem } from '../../../../shared/schemas/auth';
import type { Addition, BrewDayStep } from '../../../../shared/batches/brew-day';
import { Caution, cx } from '../../../components/ui';
import { show } from '../../../lib/units';
import { showAddition } from './format';

/** What goes in, amount first. */
export function AdditionList({
  additions,
  system,
  className,
}: {
  additions: Addition[];
  system: UnitSystem;
  className?: string;
}) {
  return (
    <ul className={cx('space-y-1', className)}>
      {additions.map((a, i) => (
        <li key={i}>
          <span className="font-bold tabular-nums">{showAddition(system, a)}</span> {a.what}
        </li>
      ))}
    </ul>
  );
}

/** A step's plan beyond its measurements: what goes in, how long to hold, water to add, yeast to pitch, and its cautions. */
export function StepDetails({ step, system }: { step: BrewDayStep; system: UnitSystem }) {
  return (
    <>
      {step.additions.length > 0 && (
        <AdditionList additions={step.additions} system={system} className="mt-3 text-xl" />
      )}
      {(step.holdMinutes !== undefined || step.infusion || step.pitchCellsBillion !== undefined) && (
        <ul className="mt-3 space-y-1 text-xl" data-testid="step-plan">
          {step.infusion && (
            <li>
              Add <span className="font-bold tabular-nums">{show(system, 'volume', step.infusion.volumeL)}</span> of
              water at{' '}
              <span className="font-bold tabular-nums">{show(system, 'temperature', step.infusion.tempC)}</span>
            </li>
          )}
          {step.holdMinutes !== undefined && (
            <li>
              Hold <span className="font-bold tabular-nums">{step.holdMinutes} min</span>
              {step.expected.tempC !== undefined && (
                <>
                  {' '}
                  at <span className="font-bold tabular-nums">{show(system, 'temperature', step.expected.tempC)}</span>
                </>
              )}
            </li>
          )}
          {step.pitchCellsBillion !== undefined && (
            <li>
              Pitch about <span className="font-bold tabular-nums">{Math.round(step.pitchCellsBillion)} billion</span>{' '}
              cells
            </li>
          )}
        </ul>
      )}
      {step.hot && (
        <div className="mt-3">
          <Caution title="Hot liquid">
            Near-boiling wort and water scald: wear gloves and eye protection, check hose clamps before pumping, and
            follow your local codes and licensed practice.
          </Caution>
        </div>
      )}
      {step.oxygen && (
        <div className="mt-3">
          <Caution title="Compressed oxygen">
            The cylinder is under high pressure and oxygen makes things burn fiercely: keep oil, grease and flames away,
            chain the cylinder upright, use a regulator made for oxygen, open the valve slowly, close it when done, and
            follow your local codes and licensed practice.
          </Caution>
        </div>
      )}
    </>
  );
}
