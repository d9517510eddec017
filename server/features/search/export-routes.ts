import { Router, type Response } from 'express';
import { allow } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { exportQuerySchema } from '../../../shared/schemas/search';
import { EXPORT_LIMIT, recordsToExport } from './export';
import { toCsv, toSdf } from './export-format';

/** `GET /api/export.csv` and `GET /api/export.sdf`: every active record a search finds, with the search's filters. */
export const exportRouter = Router();

function sendFile(res: Response, body: string, type: string, extension: string, total: number) {
  const date = new Date().toISOString().slice(0, 10);
  res.set({
    'Content-Type': type,
    'Content-Disposition': `attachment; filename="rfolio-export-${date}.${extension}"`,
    'Cache-Control': 'no-store',
    'X-Total-Count': String(total),
    'X-Export-Truncated': total > EXPORT_LIMIT ? `only the first ${EXPORT_LIMIT} records` : 'no',
  });
  res.send(body);
}

exportRouter.get(
  '/export.csv',
  allow('viewer'),
  handle({ query: exportQuerySchema }, async ({ query }, _req, res) => {
    const { records, total } = await recordsToExport(query);
    sendFile(res, toCsv(records), 'text/csv; charset=utf-8', 'csv', total);
  }),
);

exportRouter.get(
  '/export.sdf',
  allow('viewer'),
  handle({ query: exportQuerySchema }, async ({ query }, _req, res) => {
    const { records, total } = await recordsToExport(query);
    sendFile(res, toSdf(records), 'chemical/x-mdl-sdfile; charset=utf-8', 'sdf', total);
  }),
);
