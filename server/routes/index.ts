import { Router } from 'express';
import { healthRouter } from './health';
import { authRouter } from './auth';
import { invitationsRouter } from './invitations';
import { passwordResetRouter } from './password-reset';
import { adminUsersRouter } from './admin-users';
import { devMailboxRouter } from './dev-mailbox';
import { usesMailCatcher } from '../mail/send';
import { recordsRouter } from './records';
import { photosRouter } from './photos';
import { compoundsRouter } from './compounds';
import { structuresRouter } from './structures';
import { curationRouter } from './curation';
import { recordCurationRouter } from './record-curation';
import { importsRouter } from './imports';
import { scoutRouter } from './scout';
import { toolsRouter } from './tools';
import { searchRouter } from './search';
import { bookmarksRouter } from './bookmarks';
import { classesRouter } from './classes';
import { exportRouter } from './export';
import { overviewRouter } from './overview';

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
