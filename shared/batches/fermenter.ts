/** Whether a fermenter can take a batch, and how to say why not. Pure: planning, the API and the tablet share it. */
import { lToUsBbl, lToUsGal } from '../brewing';
import type { UnitSystem } from '../schemas/auth';

/**
 * The volume a fermenter must hold: the wort run into it at knockout, which is the batch volume
 * (`computed.volumes.intoFermenterL`; the trub and chiller loss stays behind in the kettle and lines).
 */
export const fermenterFill = (plan: { computed: { volumes: { intoFermenterL: number } } }) => plan.computed.volumes.intoFermenterL;

/** True when the tank is smaller than the volume it must take (1 mL of slack for rounding in stored capacities). */
export const tooSmall = (capacityL: number, fillL: number) => capacityL + 0.001 < fillL;

/** A tank-sized volume: barrels (US) or hectolitres and litres (metric), 1 bbl = 117.348 L (27 CFR 25.11). */
export function tankVolume(system: UnitSystem, litres: number): string {
  if (system === 'us') return lToUsBbl(litres) >= 2 ? `${lToUsBbl(litres).toFixed(1)} bbl` : `${lToUsGal(litres).toFixed(1)} gal`;
  return litres >= 200 ? `${(litres / 100).toFixed(1)} hL` : `${litres.toFixed(0)} L`;
}

export function tooSmallMessage(system: UnitSystem, vesselName: string, capacityL: number, fillL: number): string {
  return `${vesselName} holds ${tankVolume(system, capacityL)}, but this batch runs ${tankVolume(system, fillL)} into the fermenter at knockout. Choose a larger fermenter.`;
}
