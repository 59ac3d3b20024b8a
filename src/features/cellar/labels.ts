import type { VesselStatus, VesselType } from '../../../shared/schemas/cellar';

// Display words for vessels. Kept out of shared/schemas/cellar (only types are imported from it, which
// the build erases) so the vessel board, a wall screen opened first thing, does not load zod and every
// cellar schema just to print "Fermenter" and "Clean".
export const VESSEL_TYPE_LABELS: Record<VesselType, string> = { fermenter: 'Fermenter', bright_tank: 'Bright tank' };
export const VESSEL_STATUS_LABELS: Record<VesselStatus, string> = {
  clean: 'Clean',
  in_use: 'In use',
  needs_cleaning: 'Needs cleaning',
};
