import type { TaproomListQuery } from '../../../../shared/schemas/taproom';

/** Query keys for the taproom and releases, general to specific, so a write invalidates by prefix. */
export const taproomKeys = {
  all: ['taproom'] as const,
  beers: () => [...taproomKeys.all, 'beers'] as const,
  beerList: (query: TaproomListQuery) => [...taproomKeys.beers(), 'list', query] as const,
  beer: (id: number) => [...taproomKeys.beers(), 'detail', id] as const,
  releases: () => [...taproomKeys.all, 'releases'] as const,
  release: (batchId: number) => [...taproomKeys.releases(), batchId] as const,
  attachments: (batchId: number) => [...taproomKeys.all, 'attachments', batchId] as const,
};
