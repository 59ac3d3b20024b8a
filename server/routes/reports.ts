import type { z } from 'zod';
import { defineRouter, actor } from './define';
import { historyQuery, productionQuery } from '../../shared/schemas/reports';
import { lToHl, lToUsBbl } from '../../shared/brewing';
import * as reports from '../services/reports';

// The head brewer files the production figures; the assistant may read a recipe's batch history.
export const reportsRouter = defineRouter('/api/reports', [
  {
    method: 'get',
    path: '/production',
    access: 'report.production.read',
    query: productionQuery,
    handler: async (req, res) => {
      const { month } = req.query as unknown as z.infer<typeof productionQuery>;
      res.json(await reports.productionReport(actor(req).brewery, month));
    },
  },
  {
    method: 'get',
    path: '/production/csv',
    access: 'report.production.read',
    query: productionQuery,
    handler: async (req, res) => {
      const { month } = req.query as unknown as z.infer<typeof productionQuery>;
      const report = await reports.productionReport(actor(req).brewery, month);
      res
        .type('text/csv; charset=utf-8')
        .attachment(`production-${month}.csv`)
        .send(reports.productionCsv(report, { bbl: lToUsBbl, hl: lToHl }));
    },
  },
  {
    method: 'get',
    path: '/history',
    access: 'report.history.read',
    query: historyQuery,
    handler: async (req, res) => {
      const { recipeId, limit } = req.query as unknown as z.infer<typeof historyQuery>;
      res.json(await reports.batchHistory(actor(req).breweryId, recipeId, limit));
    },
  },
]);
