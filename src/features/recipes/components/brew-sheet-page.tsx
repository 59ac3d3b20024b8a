import type { ReactNode } from 'react';
import { useParams } from 'react-router-dom';
import {
  BrewingInputError,
  formatGaugePressure,
  headPressureKpa,
  dRestTriggerSg,
  doseUnitLabel,
  roundForMeasuring,
} from '../../../../shared/brewing';
import { SALT_LABELS } from '../../../../shared/schemas/recipes';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { Button, Caution, ErrorState, LinkButton, Loading } from '../../../components/ui';
import { useCurrentUser } from '../../../lib/current-user';
import { show, showGrain, showMeasured, showSmallWeight, showVolume } from '../../../lib/units';
import { useScale } from '../api/scale-version';
import type { ScaleResult } from '../../../../shared/contract/recipes';
import { useScaleTarget } from './scale-page';
import { showAdjunct } from './scale-view';

// Paper layout: our own margins; tables never split a row across pages.
const PRINT_CSS = `
@page { size: letter; margin: 12mm; }
@media print {
  main { max-width: none !important; padding: 0 !important; }
  .sheet section { break-inside: avoid; }
  .sheet tr { break-inside: avoid; }
  .sheet { font-size: 11pt; }
}`;

function Part({ n, title, children }: { n: number; title: string; children: ReactNode }) {
  return (
    <section className="mt-5 border-t-2 border-ink-900 pt-2">
      <h2 className="text-lg font-bold">
        {n}. {title}
      </h2>
      <div className="mt-1">{children}</div>
    </section>
  );
}

const cell = 'border border-ink-300 px-2 py-1 text-left align-top';
const tick = <span aria-hidden className="inline-block h-4 w-4 border-2 border-ink-700 align-middle" />;

function Grid({ head, rows }: { head: string[]; rows: ReactNode[][] }) {
  return (
    <table className="w-full border-collapse text-sm">
      <thead>
        <tr>
          {head.map((h) => (
            <th key={h} className={`${cell} bg-mist-100 font-semibold`}>
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((r, i) => (
          <tr key={i}>
            {r.map((c, j) => (
              <td key={j} className={`${cell} tabular-nums`}>
                {c}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function headPressure(system: UnitSystem, tempC: number, volumes: number): string {
  try {
    return formatGaugePressure(headPressureKpa(tempC, volumes), system);
  } catch (error) {
    if (error instanceof BrewingInputError) return error.message;
    throw error;
  }
}

function Sheet({ data, system }: { data: ScaleResult; system: UnitSystem }) {
  const c = data.scaled.after;
  const recipe = data.scaled.recipe;
  const content = data.version.content;
  const eq = data.target.equipment;
  const t = (celsius: number) => show(system, 'temperature', celsius, 0);
  const v = (litres: number) => show(system, 'volume', litres);
  const rules = [...content.adjuncts, ...content.spices];
  const boilAdds = [
    ...c.hops.map((h, i) => ({
      minute: h.minutes,
      use: h.use,
      what: `${h.name} (${recipe.hops[i]!.alphaAcidPct} % AA, ${content.hops[i]?.form ?? 'pellet'})`,
      amount: showSmallWeight(system, h.weightG),
      note: `${h.ibu.toFixed(1)} IBU`,
    })),
    ...c.adjuncts.map((a, i) => ({
      minute: rules[i]!.boilMinutes ?? 0,
      use: a.stage,
      what: a.name,
      amount: showAdjunct(a, system),
      note: rules[i]!.howAdded,
    })),
  ];
  const boil = boilAdds.filter((a) => a.use === 'boil').sort((x, y) => y.minute - x.minute);
  const whirlpool = boilAdds.filter((a) => a.use === 'whirlpool');
  const later = boilAdds.filter((a) => a.use === 'dryHop' || a.use === 'fermenter' || a.use === 'packaging');
  const mashAdds = boilAdds.filter((a) => a.use === 'mash');
  const f = content.fermentation;
  const dRestAt = f.dRestPointsAboveFg !== undefined ? dRestTriggerSg(c.fg, f.dRestPointsAboveFg) : undefined;
  const salts = (list: { salt: string; grams: number }[]) =>
    list.length
      ? list.map((s) => `${SALT_LABELS[s.salt as keyof typeof SALT_LABELS]}: ${s.grams.toFixed(1)} g`).join('; ')
      : 'none';
  const grainSacks = c.mashGrainKg;

  return (
    <article className="sheet mx-auto max-w-4xl bg-white text-ink-900">
      <style>{PRINT_CSS}</style>
      <header className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm font-semibold uppercase tracking-wide text-ink-500">Brew sheet</p>
          <h1 className="text-3xl font-bold">{data.recipe.name}</h1>
          <p>
            {data.recipe.style} · version {data.version.number} · {eq.name} · {showVolume(system, eq.batchVolumeL)} into
            the fermenter
          </p>
        </div>
        <dl className="grid grid-cols-2 gap-x-4 text-sm">
          <dt>Batch no.</dt>
          <dd className="w-32 border-b border-ink-700">&nbsp;</dd>
          <dt>Brew date</dt>
          <dd className="w-32 border-b border-ink-700">&nbsp;</dd>
        </dl>
      </header>
      <dl className="mt-3 grid grid-cols-3 gap-2 text-center sm:grid-cols-6">
        {[
          ['OG', c.og.toFixed(3)],
          ['FG', c.fg.toFixed(3)],
          ['ABV', `${c.abvPct.toFixed(1)} %`],
          ['IBU', c.ibu.toFixed(0)],
          ['SRM', c.srm.toFixed(0)],
          ['Pre-boil', c.preBoilGravity.toFixed(3)],
        ].map(([k, x]) => (
          <div key={k} className="rounded border border-ink-300 p-1">
            <dt className="text-xs font-semibold text-ink-500">{k}</dt>
            <dd className="text-xl font-bold tabular-nums">{x}</dd>
          </div>
        ))}
      </dl>

      <div className="mt-4 space-y-2">
        <Caution title="Hot liquids">
          Strike water at {t(c.strikeTempC)}, sparge water and boiling wort scald. Wear boots, gloves and eye
          protection; check every hose clamp and valve before a pump runs hot liquor or wort; never open a valve or lift
          a lid over a vessel while someone is below it; keep the whirlpool arm and knockout hoses secured.
        </Caution>
        <Caution title="The work on this sheet">
          {grainSacks > 20 && (
            <>
              About {showGrain(system, grainSacks)} of grain to lift: use the hoist or two people, lift with your
              legs.{' '}
            </>
          )}
          {content.adjuncts.length > 0 && (
            <>
              Adjunct preparation uses sharp knives and a hot oven: cut on a stable board, use oven gloves for hot trays
              and juices. Mesh bags come out of boiling wort hot and heavy: use a hook, not hands.{' '}
            </>
          )}
          Cleaners and sanitisers are caustic or acid: goggles and gloves, add chemical to water, never the reverse. CO₂
          displaces air: ventilate closed cellars and never exceed a vessel's rated working pressure. Follow your local
          codes and licensed practice; this sheet does not replace them.
        </Caution>
      </div>

      <Part n={1} title="Water and salts">
        <Grid
          head={['Vessel', 'Volume', 'Temperature', 'Salts']}
          rows={[
            ['Strike (mash)', v(c.volumes.strikeL), t(c.strikeTempC), c.water ? salts(c.water.mashSalts) : '—'],
            ...(c.volumes.infusionL > 0
              ? [['Step infusions (mash)', v(c.volumes.infusionL), 'see mash', '(in the mash salts)']]
              : []),
            [
              'Sparge',
              v(c.volumes.spargeL),
              `about ${t(76)} (usual sparge)`,
              c.water ? salts(c.water.spargeSalts) : '—',
            ],
            ['Total water', v(c.volumes.totalWaterL), '', ''],
          ]}
        />
        {c.water && (
          <p className="mt-1 text-sm">
            Mash water after salts: Ca {c.water.mash.calciumPpm.toFixed(0)}, Mg {c.water.mash.magnesiumPpm.toFixed(0)},
            Na {c.water.mash.sodiumPpm.toFixed(0)}, SO₄ {c.water.mash.sulfatePpm.toFixed(0)}, Cl{' '}
            {c.water.mash.chloridePpm.toFixed(0)} ppm; Cl:SO₄ {c.water.chlorideSulfateRatio?.toFixed(2) ?? '—'}.
          </p>
        )}
      </Part>

      <Part n={2} title="Grain bill">
        <Grid
          head={['', 'Fermentable', 'Weight', 'Share', 'Goes in']}
          rows={c.fermentables.map((x) => [
            tick,
            x.name,
            showGrain(system, x.weightKg),
            `${x.percent.toFixed(1)} %`,
            x.stage,
          ])}
        />
      </Part>

      <Part n={3} title="Mash">
        <p className="mb-1">
          Grain at {t(content.mash.grainTempC)}. Strike with <strong>{v(c.volumes.strikeL)}</strong> at{' '}
          <strong>{t(c.strikeTempC)}</strong> ({show(system, 'waterToGrain', c.thicknessLPerKg)}). Mash volume about{' '}
          {v(c.volumes.mashVolumeL)}.
        </p>
        <Grid
          head={['', 'Rest', 'Temperature', 'Minutes', 'How', 'Actual temp / time']}
          rows={c.mashSteps.map((s) => [
            tick,
            s.name,
            t(s.tempC),
            s.minutes,
            s.method === 'strike'
              ? 'Strike'
              : s.method === 'infusion'
                ? `Add ${v(s.waterAddedL)} at ${t(s.waterTempC ?? 95)}`
                : s.method === 'recirculate'
                  ? `Recirculate, HLT at ${t(s.hltTempC ?? s.tempC)}`
                  : 'Direct heat',
            '',
          ])}
        />
        {mashAdds.length > 0 && (
          <p className="mt-1">Into the mash: {mashAdds.map((a) => `${a.what} ${a.amount}`).join('; ')}.</p>
        )}
      </Part>

      {content.adjuncts.length > 0 && (
        <Part n={4} title="Adjunct preparation">
          {content.adjuncts.map((a, i) => (
            <div key={i} className="mb-2">
              <p className="font-semibold">
                {a.name}: {showAdjunct(c.adjuncts[i]!, system)} ({a.level} {doseUnitLabel(a.rule)}; range{' '}
                {showMeasured(roundForMeasuring(c.adjuncts[i]!.low, system))}–
                {showMeasured(roundForMeasuring(c.adjuncts[i]!.high, system))})
              </p>
              <ol className="ml-1 list-none space-y-1">
                {a.preparation.map((s, j) => (
                  <li key={j} className="flex gap-2">
                    {tick}
                    <span>
                      {j + 1}. {s.text}
                    </span>
                  </li>
                ))}
              </ol>
              <p className="text-sm">
                Goes in: {a.stage}
                {a.stage === 'boil' && a.boilMinutes !== undefined ? ` at ${a.boilMinutes} min left` : ''}. {a.howAdded}
              </p>
            </div>
          ))}
        </Part>
      )}

      <Part n={5} title={`Boil: ${eq.boilMinutes} min`}>
        <p className="mb-1">
          Pre-boil {v(c.volumes.preBoilL)} at {c.preBoilGravity.toFixed(3)}; end of boil {v(c.volumes.postBoilL)} at{' '}
          {c.postBoilGravity.toFixed(3)}. Minutes are minutes left in the boil.
        </p>
        <Grid
          head={['', 'Minutes left', 'Addition', 'Amount', 'Note', 'Time added']}
          rows={boil.map((a) => [tick, a.minute, a.what, a.amount, a.note, ''])}
        />
      </Part>

      <Part n={6} title="Whirlpool and knockout">
        {whirlpool.length > 0 && (
          <Grid
            head={['', 'Addition', 'Amount', 'Stand', 'Note']}
            rows={whirlpool.map((a, i) => {
              const hop = recipe.hops.find((h) => h.use === 'whirlpool' && a.what.startsWith(h.name));
              return [
                tick,
                a.what,
                a.amount,
                hop?.whirlpoolTempC !== undefined ? `${a.minute} min at ${t(hop.whirlpoolTempC)}` : `${a.minute} min`,
                whirlpool[i]!.note,
              ];
            })}
          />
        )}
        <p className="mt-1">
          Whirlpool, rest, then knock out {v(c.volumes.knockoutL)} through the heat exchanger to{' '}
          <strong>{t(content.yeast.pitchTempC)}</strong>; oxygenate and pitch {content.yeast.name}
          {c.yeastCellsBillion !== undefined
            ? ` (about ${c.yeastCellsBillion >= 1000 ? `${(c.yeastCellsBillion / 1000).toFixed(1)} trillion` : `${c.yeastCellsBillion.toFixed(0)} billion`} cells)`
            : ''}
          . {showVolume(system, c.volumes.intoFermenterL)} into the fermenter.
        </p>
      </Part>

      <Part n={7} title="Fermentation plan">
        <ul className="space-y-1">
          <li className="flex gap-2">
            {tick} Primary at {t(f.primaryTempC)}; expected FG {c.fg.toFixed(3)} ({content.yeast.attenuationLowPct}–
            {content.yeast.attenuationHighPct} % attenuation).
          </li>
          {dRestAt !== undefined && f.dRestTempC !== undefined && (
            <li className="flex gap-2">
              {tick} Diacetyl rest: when gravity reaches {dRestAt.toFixed(3)} ({f.dRestPointsAboveFg} points above FG),
              raise to {t(f.dRestTempC)} until terminal.
            </li>
          )}
          {later.map((a, i) => (
            <li key={i} className="flex gap-2">
              {tick} {a.use === 'dryHop' ? 'Dry hop' : a.use === 'packaging' ? 'At packaging' : 'Into the fermenter'}:{' '}
              {a.what}, {a.amount}.
            </li>
          ))}
          <li className="flex gap-2">
            {tick} Crash to {t(f.crashTempC)}.
          </li>
          <li className="flex gap-2">
            {tick} Carbonate to {f.co2Volumes} volumes CO₂: about {headPressure(system, f.crashTempC, f.co2Volumes)}{' '}
            head pressure at {t(f.crashTempC)}.
          </li>
        </ul>
      </Part>

      <section className="mt-6 border-t-2 border-ink-900 pt-2">
        <h2 className="text-lg font-bold">Sign-off</h2>
        <div className="mt-3 grid grid-cols-2 gap-x-8 gap-y-6 text-sm">
          {[
            'Measured OG',
            'Volume into fermenter',
            'Brewed by',
            'Date and time',
            'Checked by (head brewer)',
            'Date',
          ].map((x) => (
            <div key={x} className="border-b border-ink-700 pb-6">
              {x}
            </div>
          ))}
        </div>
      </section>
    </article>
  );
}

/** The print-ready brew sheet for a version at a scale (address: ?equipmentProfileId=&batchVolumeL=). */
export function BrewSheetPage() {
  const recipeId = Number(useParams().recipeId);
  const versionId = Number(useParams().versionId);
  const me = useCurrentUser();
  const [target] = useScaleTarget();
  const scale = useScale(recipeId, versionId, target);
  if (scale.isPending) return <Loading label="Preparing the brew sheet" />;
  if (scale.isError) return <ErrorState error={scale.error} onRetry={() => scale.refetch()} />;
  return (
    <>
      <div className="no-print mb-4 flex flex-wrap gap-2">
        <Button onClick={() => window.print()}>Print</Button>
        <LinkButton
          to={`/recipes/${recipeId}/versions/${versionId}/scale?${new URLSearchParams(Object.entries(target).map(([k, x]) => [k, String(x)])).toString()}`}
        >
          Back to scaling
        </LinkButton>
      </div>
      <Sheet data={scale.data} system={me.brewery.unitSystem} />
    </>
  );
}
