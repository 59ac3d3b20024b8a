import { srmToHex } from '../../../../shared/brewing';
import {
  GLASSES,
  ALLERGENS,
  shownAbvPct,
  type PackageSize,
  type TaproomBeer,
} from '../../../../shared/schemas/taproom';
import { OFF_FLAVOURS, type TastingSummary } from '../../../../shared/schemas/tasting';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import { show } from '../../../lib/units';
import { cx } from '../../../components/ui';

export const abvText = (beer: Pick<TaproomBeer, 'abvPct' | 'abvIsPlanned'>) =>
  `${beer.abvIsPlanned ? '≈ ' : ''}${shownAbvPct(beer.abvPct).toFixed(1)} %`;

const GLASS_SIZES = { md: 'h-12 w-9', lg: 'h-14 w-10 sm:h-20 sm:w-14' } as const;

/**
 * The beer's colour from its SRM, with the number beside it (or under it, `stacked`) for anyone who cannot tell
 * colours apart. The number keeps one width whatever its digits, so names beside a column of swatches line up.
 */
export function ColourSwatch({
  srm,
  size = 'md',
  stacked = false,
}: {
  srm: number;
  size?: keyof typeof GLASS_SIZES;
  stacked?: boolean;
}) {
  return (
    <span className={cx('inline-flex items-center', stacked ? 'flex-col gap-1' : 'gap-2')}>
      <span
        aria-hidden
        className={cx(
          'inline-block shrink-0 rounded-b-xl rounded-t-sm border-2 border-ink-900/20 shadow-inner',
          GLASS_SIZES[size],
        )}
        style={{ backgroundColor: srmToHex(srm) }}
      />
      <span
        className={cx('min-w-[3.75rem] whitespace-nowrap text-sm tabular-nums text-ink-500', stacked && 'text-center')}
      >
        SRM {srm.toFixed(0)}
      </span>
    </span>
  );
}

/** The glass and the serving temperature, each a short phrase that reads badly split over two lines. */
export const servingParts = (beer: Pick<TaproomBeer, 'glass' | 'servingTempC'>, units: UnitSystem): string[] => [
  GLASSES[beer.glass],
  show(units, 'temperature', beer.servingTempC, 0),
];

export const servingLine = (beer: Pick<TaproomBeer, 'glass' | 'servingTempC'>, units: UnitSystem): string =>
  servingParts(beer, units).join(' · ');

export const packagesLine = (sizes: PackageSize[]) => sizes.map((s) => `${s.count} × ${s.label}`).join(' · ');

export const allergensLine = (beer: Pick<TaproomBeer, 'allergens'>) =>
  beer.allergens.length ? beer.allergens.map((a) => ALLERGENS[a]).join(', ') : 'None listed';

export function tastingLine(t: TastingSummary): string | null {
  if (!t.tasters) return null;
  return `${t.averageScore?.toFixed(1)} / 5 from ${t.tasters} taster${t.tasters === 1 ? '' : 's'}`;
}

export const offFlavoursLine = (t: TastingSummary) => t.offFlavours.map((o) => OFF_FLAVOURS[o].label).join(', ');
