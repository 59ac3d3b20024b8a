import { fToC } from '../../../shared/brewing';
import type { CarbonationUnits } from '../../../shared/brewing';
import type { TempUnit } from '../../../shared/schemas/cellar';

/** A temperature the screen sent in its unit, in °C. */
export const toC = (value: number, unit: TempUnit) => (unit === 'f' ? fToC(value) : value);

/** A screen that sends °F shows psi (a US brewery); one that sends °C shows kPa. */
export const screenUnits = (tempUnit: 'c' | 'f'): CarbonationUnits => (tempUnit === 'f' ? 'us' : 'metric');
