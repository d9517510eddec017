import { Router } from 'express';
import { healthRouter } from './health';
import { authRouter } from '../features/auth/routes';
import { invitationsRouter } from '../features/people/invitations-routes';
import { passwordResetRouter } from '../features/auth/password-reset-routes';
import { adminUsersRouter } from '../features/people/users-routes';
import { devMailboxRouter } from '../features/mailbox/routes';
import { usesMailCatcher } from '../mail/send';
import { recordsRouter } from '../features/records/routes';
import { photosRouter } from '../features/records/photo-routes';
import { compoundsRouter } from '../features/compounds/routes';
import { structuresRouter } from '../features/compounds/structure-routes';
import { curationRouter } from '../features/curation/routes';
import { recordCurationRouter } from '../features/curation/record-routes';
import { importsRouter } from '../features/imports/routes';
import { scoutRouter } from '../features/scout/routes';
import { toolsRouter } from '../features/tools/routes';
import { searchRouter } from '../features/search/routes';
import { bookmarksRouter } from '../features/bookmarks/routes';
import { classesRouter } from '../features/classes/routes';
import { exportRouter } from '../features/search/export-routes';
import { overviewRouter } from '../features/home/routes';

/** Every API router, mounted under /api. Each route's first handler is `allow(level)`. */
export function apiRouter(): Router {
  const api = Router();
  api.use('/health', healthRouter);
  api.use('/auth/invitations', invitationsRouter);
  api.use('/auth/password-reset', passwordResetRouter);
  api.use('/auth', authRouter);
  api.use('/admin/users', adminUsersRouter);
  if (usesMailCatcher()) api.use('/dev/mailbox', devMailboxRouter);
  api.use('/records', recordCurationRouter);
  api.use('/records', recordsRouter);
  api.use('/photos', photosRouter);
  api.use('/compounds', compoundsRouter);
  api.use('/structures', structuresRouter);
  api.use('/curation', curationRouter);
  api.use('/imports', importsRouter);
  api.use('/scout', scoutRouter);
  api.use('/tools', toolsRouter);
  api.use('/search', searchRouter);
  api.use('/bookmarks', bookmarksRouter);
  api.use('/classes', classesRouter);
  api.use(exportRouter);
  api.use('/overview', overviewRouter);
  return api;
}
