import { z } from 'zod';
import {
  idParam,
  publishReleaseSchema,
  releaseSheetSchema,
  taproomListQuery,
  type ReleaseDetail,
  type ReleaseState,
  type TaproomBeer,
} from '../schemas/taproom';
import { route } from './route';

const batchParams = z.strictObject({ batchId: idParam });
const beerParams = z.strictObject({ beerId: idParam });

export interface BeerList {
  beers: TaproomBeer[];
  styles: string[];
}

export interface ReleaseCandidate {
  batchId: number;
  number: string;
  beerName: string;
  status: string;
  state: ReleaseState | null;
}

export const taproomRoutes = {
  beers: route<BeerList>()({ method: 'get', path: '/api/taproom/beers', query: taproomListQuery }),
  beer: route<TaproomBeer>()({ method: 'get', path: '/api/taproom/beers/:beerId', params: beerParams }),
  releases: route<ReleaseCandidate[]>()({ method: 'get', path: '/api/taproom/releases' }),
};

export const releaseRoutes = {
  get: route<ReleaseDetail>()({ method: 'get', path: '/api/batches/:batchId/release', params: batchParams }),
  saveSheet: route<ReleaseDetail>()({
    method: 'put',
    path: '/api/batches/:batchId/release',
    params: batchParams,
    body: releaseSheetSchema,
  }),
  publish: route<ReleaseDetail>()({
    method: 'post',
    path: '/api/batches/:batchId/release/publish',
    params: batchParams,
    body: publishReleaseSchema,
  }),
  offTap: route<ReleaseDetail>()({
    method: 'post',
    path: '/api/batches/:batchId/release/off-tap',
    params: batchParams,
  }),
  backOnTap: route<ReleaseDetail>()({
    method: 'post',
    path: '/api/batches/:batchId/release/back-on-tap',
    params: batchParams,
  }),
};
