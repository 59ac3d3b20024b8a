import { useState } from 'react';
import { Button, Caution, SuggestionChip, TextField } from '../../../components/ui';
import { formatGaugePressure } from '../../../../shared/brewing';
import type { CellarPlanView, VesselView } from '../../../../shared/schemas/cellar';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { displayUnit } from '../../../lib/units';
import { useCarbonation } from '../api/carbonation';
import { useLogCellarEntry } from '../api/log-cellar-entry';
import { useSubmitOnce } from '../../../lib/use-submit-once';
import { optionalNumber } from './form-values';

const pressure = (system: UnitSystem, kpa: number) => formatGaugePressure(kpa, system);

/** The head pressure to set for a CO2 target, never above the vessel's rated working pressure. */
export function CarbonationPanel({
  batchId,
  vessel,
  plan,
  unitSystem,
}: {
  batchId: number;
  vessel: VesselView;
  plan: CellarPlanView;
  unitSystem: UnitSystem;
}) {
  const temp = displayUnit('temperature', unitSystem);
  // Empty until the person types or taps the plan's figure: a logged pressure is for the beer they measured.
  const [volumes, setVolumes] = useState('');
  const [beerTemp, setBeerTemp] = useState('');
  const planTemp = temp.fromSi(plan.crashTempC).toFixed(1);
  const [saved, setSaved] = useState<string>();
  const log = useLogCellarEntry(batchId);
  const [co2Volumes, tempValue] = [optionalNumber(volumes.trim()), optionalNumber(beerTemp.trim())];
  const tempUnit = unitSystem === 'us' ? 'f' : 'c';
  const query =
    Number.isFinite(co2Volumes) && Number.isFinite(tempValue)
      ? ({ vesselId: vessel.id, co2Volumes: co2Volumes!, temp: tempValue!, tempUnit } as const)
      : null;
  const answer = useCarbonation(query);
  const { once, busy } = useSubmitOnce();

  return (
    <div className="space-y-3">
      <div className="grid grid-cols-2 gap-3">
        <TextField
          label="Target CO₂ (volumes)"
          inputMode="decimal"
          className="text-2xl"
          value={volumes}
          onChange={(e) => setVolumes(e.target.value)}
        />
        <TextField
          label={`Beer temperature (${temp.unit})`}
          inputMode="decimal"
          className="text-2xl"
          value={beerTemp}
          onChange={(e) => setBeerTemp(e.target.value)}
        />
        <div>
          <SuggestionChip label="Plan" onPick={() => setVolumes(String(plan.co2Volumes))}>
            {plan.co2Volumes} vol
          </SuggestionChip>
        </div>
        <div>
          <SuggestionChip label="Plan crash" onPick={() => setBeerTemp(planTemp)}>
            {planTemp} {temp.unit}
          </SuggestionChip>
        </div>
      </div>
      {answer.data && (
        <p className="rounded-lg bg-cellar-100 p-4" data-testid="carbonation-answer">
          Set the head pressure on {vessel.name} to{' '}
          <strong className="text-3xl tabular-nums">{pressure(unitSystem, answer.data.pressureKpa)}</strong> (gauge).
          <span className="block text-sm text-ink-700">
            Rated working pressure of {vessel.name}: {pressure(unitSystem, vessel.ratedPressureKpa)}.
          </span>
        </p>
      )}
      {answer.error && (
        <p role="alert" className="rounded-lg bg-ember-100 p-4 font-semibold text-ember-700">
          {answer.error.message}
        </p>
      )}
      <Caution title="Pressurised CO₂">
        Never exceed the vessel's rated working pressure, and keep a working pressure relief valve on it. CO₂ displaces
        air: ventilate closed rooms. Follow your local codes and licensed practice.
      </Caution>
      <Button
        size="lg"
        className="w-full"
        disabled={!answer.data}
        busy={busy}
        onClick={once(async () => {
          if (!query || !answer.data) return;
          const label = `Carbonation set · ${volumes} vol at ${pressure(unitSystem, answer.data.pressureKpa)}`;
          await log(
            {
              kind: 'action',
              action: 'carbonation',
              co2Volumes: query.co2Volumes,
              temp: query.temp,
              tempUnit,
              pressureKpa: answer.data.pressureKpa,
            },
            label,
          );
          setSaved(label);
          setVolumes('');
          setBeerTemp('');
        })}
      >
        Log this pressure as set
      </Button>
      {saved && (
        <p role="status" className="text-sm text-ink-700">
          Saved on this tablet: {saved}.
        </p>
      )}
    </div>
  );
}
