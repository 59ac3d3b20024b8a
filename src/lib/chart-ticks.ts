/** Axis ticks a person reads at a glance: evenly spaced steps of 1, 2 or 5 × a power of ten. */
export interface NiceAxis {
  /** From the first tick to the last, so the axis starts and ends on a labelled value. */
  domain: [number, number];
  ticks: number[];
  /** Decimals that show every tick exactly (0.005 → 3, 0.2 → 1, 5 → 0). */
  decimals: number;
}

const STEPS = [1, 2, 5, 10];

/**
 * Round, evenly spaced ticks covering `values` widened by `pad` on each side, about `target` steps
 * apart (recharts' own ticks on a fixed domain split it evenly, which gave 1.009 / 1.024 / 1.039).
 */
export function niceAxis(
  values: readonly (number | null | undefined)[],
  { pad = 0, target = 5 }: { pad?: number; target?: number } = {},
): NiceAxis {
  const finite = values.filter((v): v is number => typeof v === 'number' && Number.isFinite(v));
  let low = finite.length ? Math.min(...finite) - pad : 0;
  let high = finite.length ? Math.max(...finite) + pad : 1;
  if (high <= low) {
    const half = Math.abs(low) > 0 ? Math.abs(low) * 0.01 : 0.5;
    low -= half;
    high += half;
  }
  const raw = (high - low) / target;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = STEPS.map((m) => m * power).find((s) => s >= raw * (1 - 1e-9))!;
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const fix = (v: number) => Number(v.toFixed(decimals));
  const first = Math.floor(low / step + 1e-9) * step;
  const last = Math.ceil(high / step - 1e-9) * step;
  const ticks: number[] = [];
  for (let i = 0; first + i * step <= last + step / 2; i++) ticks.push(fix(first + i * step));
  return { domain: [ticks[0]!, ticks[ticks.length - 1]!], ticks, decimals };
}
