import { defineRouter } from './define';
import { reportRoutes } from '../../shared/contract/reports';
import { lToHl, lToUsBbl } from '../../shared/brewing';
import * as reports from '../services/reports';

// The head brewer files the production figures; the assistant may read a recipe's batch history.
export const reportsRouter = defineRouter('/api/reports', reportRoutes, {
  production: {
    access: 'report.production.read',
    handler: async ({ user, query, res }) => {
      res.json(await reports.productionReport(user.brewery, query.month));
    },
  },
  productionCsv: {
    access: 'report.production.read',
    handler: async ({ user, query, res }) => {
      const report = await reports.productionReport(user.brewery, query.month);
      res
        .type('text/csv; charset=utf-8')
        .attachment(`production-${query.month}.csv`)
        .send(reports.productionCsv(report, { bbl: lToUsBbl, hl: lToHl }, user.brewery.unitSystem));
    },
  },
  history: {
    access: 'report.history.read',
    handler: async ({ user, query, res }) => {
      res.json(await reports.batchHistory(user.breweryId, query.recipeId, query.limit));
    },
  },
});
