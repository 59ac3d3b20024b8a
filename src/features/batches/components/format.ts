import { roundForMeasuring } from '../../../../shared/brewing';
import type { UnitSystem } from '../../../../shared/schemas/auth';
import type { Addition } from '../../../../shared/batches/brew-day';
import { showMeasured, showSmallWeight } from '../../../lib/units';
import { measurementWords } from '../../../../shared/batches/entry-words';

export function showAddition(system: UnitSystem, a: Addition): string {
  if (a.amount.unit === 'g') return showSmallWeight(system, a.amount.value);
  if (a.amount.unit === 'each') return `${a.amount.value} each`;
  return showMeasured(roundForMeasuring({ value: a.amount.value, unit: a.amount.unit }, system));
}

export const showSg = (sg: number) => sg.toFixed(3);

/** Measurements as a short line, in the brewery's units (worded as the batch record words them). */
export function showMeasurements(
  system: UnitSystem,
  m: { tempC?: number; volumeL?: number; gravitySg?: number; ph?: number },
): string {
  return measurementWords(system, m).join(' · ');
}

/** Today's date (YYYY-MM-DD) in the brewery's time zone: after 8 pm in Halifax the UTC date is already tomorrow. */
export function todayIn(timeZone: string, now: Date = new Date()): string {
  return dateIn(now.toISOString(), timeZone);
}

/** The calendar date (YYYY-MM-DD) of an instant in the brewery's time zone. */
export function dateIn(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(
    new Date(iso),
  );
}
