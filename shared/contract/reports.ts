import { historyQuery, productionQuery, type BatchHistory, type ProductionReport } from '../schemas/reports';
import { route } from './route';

export const reportRoutes = {
  production: route<ProductionReport>()({ method: 'get', path: '/api/reports/production', query: productionQuery }),
  /** The same report as a CSV download (text). */
  productionCsv: route<string>()({ method: 'get', path: '/api/reports/production/csv', query: productionQuery }),
  history: route<BatchHistory>()({ method: 'get', path: '/api/reports/history', query: historyQuery }),
};
