import { Router, type Application } from 'express';
import { allow } from '../../http/middleware/access';
import { buildOpenApiDocument } from './document';

/** GET /api/openapi.json: the OpenAPI document of the routes this app has mounted, built once per app. */
export const apiDocsRouter = Router();

const built = new WeakMap<Application, string>();

apiDocsRouter.get('/openapi.json', allow('public'), (req, res) => {
  let body = built.get(req.app);
  if (!body) {
    body = JSON.stringify(buildOpenApiDocument(req.app));
    built.set(req.app, body);
  }
  res.set('Cache-Control', 'no-cache').type('application/json').send(body);
});
