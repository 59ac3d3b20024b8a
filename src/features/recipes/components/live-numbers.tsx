import { useMemo } from 'react';
import {
  BrewingInputError,
  computeRecipe,
  targetWarnings,
  waterDoseWarnings,
  type BrewingWarning,
  type ComputedAdjunct,
  type ComputedRecipe,
  type EquipmentProfile,
} from '../../../../shared/brewing';
import {
  adjunctSchema,
  equipmentAtVolume,
  recipeContentSchema,
  spiceSchema,
  resolveHopShares,
  toRecipeInput,
  type RecipeVersionContent,
} from '../../../../shared/schemas/recipes';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { show, showVolume } from '../../../lib/units';
import { cx } from '../../../components/ui';

export interface LiveNumbers {
  computed?: ComputedRecipe;
  problem?: string;
  /** Rows the numbers leave out while they are being filled in, e.g. "Spice 2". */
  leftOut?: string[];
  warnings: BrewingWarning[];
  /** The computed adjunct for the i-th addition on the form (prepared adjuncts, then spices), if it was counted. */
  adjunctAt: (i: number) => ComputedAdjunct | undefined;
}

interface RowsIn {
  adjuncts?: unknown[];
  spices?: unknown[];
}

/**
 * The content without adjunct and spice rows that are not complete yet (a row just added has no
 * name), so the rest of the recipe still has numbers; `slots` maps each form row to its computed row.
 */
function withoutIncompleteRows(content: unknown): {
  content: unknown;
  slots: (number | undefined)[];
  leftOut: string[];
} {
  const rows = (content ?? {}) as RowsIn;
  const slots: (number | undefined)[] = [];
  const leftOut: string[] = [];
  let next = 0;
  const keep = (list: unknown[] | undefined, schema: typeof adjunctSchema | typeof spiceSchema, label: string) =>
    (list ?? []).filter((row, i) => {
      const ok = schema.safeParse(row).success;
      slots.push(ok ? next++ : undefined);
      if (!ok) leftOut.push(`${label} ${i + 1}`);
      return ok;
    });
  const adjuncts = keep(rows.adjuncts, adjunctSchema, 'Adjunct');
  const spices = keep(rows.spices, spiceSchema, 'Spice');
  return { content: { ...rows, adjuncts, spices }, slots, leftOut };
}

/** Every number for the editor's current values, from shared/brewing; nothing is computed here. */
export function useLiveNumbers(name: string, content: unknown, equipment: EquipmentProfile | undefined): LiveNumbers {
  const json = JSON.stringify(content);
  return useMemo(() => {
    const none = () => undefined;
    if (!equipment)
      return { problem: 'Choose the equipment this recipe is written for.', warnings: [], adjunctAt: none };
    const { content: complete, slots, leftOut } = withoutIncompleteRows(JSON.parse(json));
    const parsed = recipeContentSchema.safeParse(complete);
    if (!parsed.success)
      return {
        problem: 'Some fields need attention; the numbers update once they are filled in.',
        warnings: [],
        adjunctAt: none,
      };
    try {
      const atVolume = equipmentAtVolume(equipment, parsed.data.targets.batchVolumeL);
      const c: RecipeVersionContent = resolveHopShares(name || 'Recipe', parsed.data, atVolume);
      const computed = computeRecipe(toRecipeInput(name || 'Recipe', c), atVolume);
      const warnings = [
        ...computed.warnings,
        ...targetWarnings(computed, c.targets),
        ...(computed.water ? waterDoseWarnings(computed.water) : []),
      ];
      const adjunctAt = (i: number) => {
        const slot = slots[i];
        return slot === undefined ? undefined : computed.adjuncts[slot];
      };
      return { computed, warnings, adjunctAt, ...(leftOut.length ? { leftOut } : {}) };
    } catch (error) {
      if (error instanceof BrewingInputError) return { problem: error.message, warnings: [], adjunctAt: none };
      throw error;
    }
  }, [name, json, equipment]);
}

function Figure({ label, children, className }: { label: string; children: React.ReactNode; className?: string }) {
  return (
    <div role="group" aria-label={label} className={cx('rounded-lg bg-mist-100 px-3 py-2', className)}>
      <div className="text-xs font-semibold uppercase tracking-wide text-ink-500">{label}</div>
      <div className="text-2xl font-semibold tabular-nums text-ink-900">{children}</div>
    </div>
  );
}

/** The live panel beside the editor: the big figures, then water and volumes, then warnings. */
export function LiveNumbersPanel({ live, system }: { live: LiveNumbers; system: UnitSystem }) {
  const c = live.computed;
  return (
    <section aria-label="Live numbers" className="space-y-3">
      {live.problem && <p className="rounded-lg bg-sky-100 p-3 text-sm text-sky-700">{live.problem}</p>}
      {live.leftOut && (
        <p className="rounded-lg bg-sky-100 p-3 text-sm text-sky-700">
          Leaving out {live.leftOut.join(', ')} until {live.leftOut.length > 1 ? 'they are' : 'it is'} filled in.
        </p>
      )}
      <div className="grid grid-cols-2 gap-2">
        {bigFigures(c).map(([label, value]) => (
          <Figure key={label} label={label}>
            {label === 'SRM' ? (
              <span className="flex items-center gap-2">
                {c && (
                  <span
                    aria-hidden
                    className="inline-block h-6 w-6 rounded-full border border-ink-300"
                    style={{ backgroundColor: c.colourHex }}
                  />
                )}
                {value}
              </span>
            ) : (
              value
            )}
          </Figure>
        ))}
        <Figure label="BU:GU">{c ? c.buGu.toFixed(2) : '—'}</Figure>
      </div>
      {c && (
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 rounded-lg border border-mist-200 bg-white p-3 text-sm">
          <dt className="text-ink-500">Strike water</dt>
          <dd className="text-right font-semibold tabular-nums">
            {show(system, 'volume', c.volumes.strikeL)} at {show(system, 'temperature', c.strikeTempC)}
          </dd>
          <dt className="text-ink-500">Sparge water</dt>
          <dd className="text-right tabular-nums">{show(system, 'volume', c.volumes.spargeL)}</dd>
          <dt className="text-ink-500">Pre-boil</dt>
          <dd className="text-right tabular-nums">
            {show(system, 'volume', c.volumes.preBoilL)} at {c.preBoilGravity.toFixed(3)}
          </dd>
          <dt className="text-ink-500">Mash volume</dt>
          <dd className="text-right tabular-nums">{show(system, 'volume', c.volumes.mashVolumeL)}</dd>
          <dt className="text-ink-500">Into fermenter</dt>
          <dd className="text-right tabular-nums">{showVolume(system, c.volumes.intoFermenterL)}</dd>
          {c.water && (
            <>
              <dt className="text-ink-500">Cl : SO₄</dt>
              <dd className="text-right tabular-nums">
                {c.water.chlorideSulfateRatio === null ? '—' : c.water.chlorideSulfateRatio.toFixed(2)}
              </dd>
              <dt className="text-ink-500">Mash Ca / Mg / Na</dt>
              <dd className="text-right tabular-nums">
                {c.water.mash.calciumPpm.toFixed(0)} / {c.water.mash.magnesiumPpm.toFixed(0)} /{' '}
                {c.water.mash.sodiumPpm.toFixed(0)} ppm
              </dd>
              <dt className="text-ink-500">Mash SO₄ / Cl / HCO₃</dt>
              <dd className="text-right tabular-nums">
                {c.water.mash.sulfatePpm.toFixed(0)} / {c.water.mash.chloridePpm.toFixed(0)} /{' '}
                {c.water.mash.bicarbonatePpm.toFixed(0)} ppm
              </dd>
              <dt className="text-ink-500">Residual alkalinity</dt>
              <dd className="text-right tabular-nums">
                {c.water.residualAlkalinity.asCaCO3Ppm.toFixed(0)} ppm as CaCO₃
              </dd>
            </>
          )}
        </dl>
      )}
      {live.warnings.length > 0 && (
        <ul aria-label="Warnings" className="space-y-1">
          {live.warnings.map((w, i) => (
            <li key={i} className="rounded-lg border-l-4 border-brass-500 bg-brass-100 px-3 py-2 text-sm text-ink-900">
              {w.message}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** OG, FG, ABV, IBU and SRM as both the live panel and the editing bar show them (one rounding for both). */
function bigFigures(c: LiveNumbers['computed']): [string, string][] {
  return [
    ['OG', c ? c.og.toFixed(3) : '—'],
    ['FG', c ? c.fg.toFixed(3) : '—'],
    ['ABV', c ? `${c.abvPct.toFixed(1)} %` : '—'],
    ['IBU', c ? c.ibu.toFixed(1) : '—'],
    ['SRM', c ? c.srm.toFixed(1) : '—'],
  ];
}

/**
 * The big figures in a bar held at the foot of the screen while editing, below the width where the
 * live panel sits beside the form (on a portrait tablet the panel is thousands of pixels down).
 */
export function NumbersBar({ live }: { live: LiveNumbers }) {
  const c = live.computed;
  const figures = bigFigures(c);
  const notes = live.warnings.length + (live.problem ? 1 : 0);
  return (
    <section
      aria-label="Numbers while editing"
      className="sticky bottom-0 z-30 -mx-1 rounded-t-xl bg-cellar-800 px-4 py-2 text-white shadow-lg lg:hidden"
    >
      <div className="flex items-center gap-4">
        <dl className="flex flex-1 flex-wrap justify-between gap-x-4">
          {figures.map(([k, v]) => (
            <div key={k} className="min-w-16">
              <dt className="text-xs font-semibold uppercase tracking-wide text-mist-200">{k}</dt>
              <dd className="flex items-center gap-1 text-xl font-semibold tabular-nums">
                {k === 'SRM' && c && (
                  <span
                    aria-hidden
                    className="inline-block h-4 w-4 rounded-full border border-white/60"
                    style={{ backgroundColor: c.colourHex }}
                  />
                )}
                {v}
              </dd>
            </div>
          ))}
        </dl>
        <a
          href="#live-numbers"
          className="flex min-h-touch items-center rounded-lg border border-white/60 px-3 text-sm font-semibold"
        >
          {notes > 0 ? `${notes} note${notes > 1 ? 's' : ''}` : 'Details'}
        </a>
      </div>
    </section>
  );
}
