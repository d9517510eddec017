import { Router } from 'express';
import { allow } from '../../http/middleware/access';
import { caughtMail, mailCatcherPort } from '../../mail/mailbox';
import type { z } from 'zod';
import type { mailboxSchema } from '../../../shared/schemas/accounts';

/** Mounted at /api/dev/mailbox outside production only: what the local mail catcher received. */
export const devMailboxRouter = Router();

devMailboxRouter.get('/', allow('admin'), (_req, res) => {
  const body: z.infer<typeof mailboxSchema> = { items: caughtMail(), smtpPort: mailCatcherPort() };
  res.set('Cache-Control', 'no-store').json(body);
});
