import { srmToHex } from '../../../../shared/brewing';
import { GLASSES, ALLERGENS, shownAbvPct, type PackageSize, type TaproomBeer } from '../../../../shared/schemas/taproom';
import { OFF_FLAVOURS, type TastingSummary } from '../../../../shared/schemas/tasting';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { show } from '../../../lib/units';
import { cx } from '../../../components/ui';

export const abvText = (beer: Pick<TaproomBeer, 'abvPct' | 'abvIsPlanned'>) => `${beer.abvIsPlanned ? '≈ ' : ''}${shownAbvPct(beer.abvPct).toFixed(1)} %`;

/** The beer's colour from its SRM, with the number beside it for anyone who cannot tell colours apart. */
export function ColourSwatch({ srm, size = 'md' }: { srm: number; size?: 'md' | 'lg' }) {
  return (
    <span className="inline-flex items-center gap-2">
      <span
        aria-hidden
        className={cx('inline-block rounded-b-xl rounded-t-sm border-2 border-ink-900/20 shadow-inner', size === 'lg' ? 'h-20 w-14' : 'h-12 w-9')}
        style={{ backgroundColor: srmToHex(srm) }}
      />
      <span className="text-sm text-ink-500">SRM {srm.toFixed(0)}</span>
    </span>
  );
}

export function servingLine(beer: Pick<TaproomBeer, 'glass' | 'servingTempC'>, units: UnitSystem): string {
  return `${GLASSES[beer.glass]} · ${show(units, 'tempC', beer.servingTempC, 0)}`;
}

export const packagesLine = (sizes: PackageSize[]) => sizes.map((s) => `${s.count} × ${s.label}`).join(' · ');

export const allergensLine = (beer: Pick<TaproomBeer, 'allergens'>) =>
  beer.allergens.length ? beer.allergens.map((a) => ALLERGENS[a]).join(', ') : 'None listed';

export function tastingLine(t: TastingSummary): string | null {
  if (!t.tasters) return null;
  return `${t.averageScore?.toFixed(1)} / 5 from ${t.tasters} taster${t.tasters === 1 ? '' : 's'}`;
}

export const offFlavoursLine = (t: TastingSummary) => t.offFlavours.map((o) => OFF_FLAVOURS[o].label).join(', ');
