/** Query keys for the cellar, general to specific: writes invalidate `cellarKeys.all`. */
export const cellarKeys = {
  all: ['cellar'] as const,
  board: () => [...cellarKeys.all, 'board'] as const,
  vessels: () => [...cellarKeys.all, 'vessels'] as const,
  batch: (batchId: number) => [...cellarKeys.all, 'batch', batchId] as const,
  alerts: () => [...cellarKeys.all, 'alerts'] as const,
  carbonation: (query: object) => [...cellarKeys.all, 'carbonation', query] as const,
};
