/** Whether a fermenter can take a batch, and how to say why not. Pure: planning, the API and the tablet share it. */
import { showVolume } from '../quantities';
import type { UnitSystem } from '../schemas/auth';

/**
 * The volume a fermenter must hold: the wort run into it at knockout, which is the batch volume
 * (`computed.volumes.intoFermenterL`; the trub and chiller loss stays behind in the kettle and lines).
 */
export const fermenterFill = (plan: { computed: { volumes: { intoFermenterL: number } } }) =>
  plan.computed.volumes.intoFermenterL;

/** True when the tank is smaller than the volume it must take (1 mL of slack for rounding in stored capacities). */
export const tooSmall = (capacityL: number, fillL: number) => capacityL + 0.001 < fillL;

export function tooSmallMessage(system: UnitSystem, vesselName: string, capacityL: number, fillL: number): string {
  return `${vesselName} holds ${showVolume(system, capacityL)}, but this batch runs ${showVolume(system, fillL)} into the fermenter at knockout. Choose a larger fermenter.`;
}
