import { Router } from 'express';
import { healthRouter } from './health';
import { authRouter } from './auth';

/** Every API router, mounted under /api. Each route's first handler is `allow(level)`. */
export function apiRouter(): Router {
  const api = Router();
  api.use('/health', healthRouter);
  api.use('/auth', authRouter);
  return api;
}
