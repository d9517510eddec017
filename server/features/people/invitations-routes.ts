import { Router } from 'express';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { signIn } from '../../auth/sign-in';
import { toSessionUser } from '../../auth/passport';
import { idParamSchema } from '../../../shared/schemas/common';
import { invitationAcceptSchema, tokenParamSchema } from '../../../shared/schemas/auth';
import {
  invitationCreateSchema,
  invitationListQuerySchema,
  type InvitationPreview,
} from '../../../shared/schemas/accounts';
import { presentInvitation } from './presenters';
import * as invitations from './invitations';

/** Mounted at /api/auth/invitations. Admins invite, resend and revoke; the link's holder accepts. */
export const invitationsRouter = Router();

invitationsRouter.get(
  '/',
  allow('admin'),
  handle({ query: invitationListQuerySchema }, async ({ query }, _req, res) => {
    const rows = await invitations.listInvitations(query.status);
    res.json({ items: rows.map(presentInvitation) });
  }),
);

invitationsRouter.post(
  '/',
  allow('admin'),
  handle({ body: invitationCreateSchema }, async ({ body }, req, res) => {
    const inv = await invitations.createInvitation(currentUser(req), body);
    res.status(201).json(presentInvitation(inv));
  }),
);

invitationsRouter.post(
  '/:id/resend',
  allow('admin'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    res.json(presentInvitation(await invitations.resendInvitation(currentUser(req), params.id)));
  }),
);

invitationsRouter.post(
  '/:id/revoke',
  allow('admin'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    res.json(presentInvitation(await invitations.revokeInvitation(currentUser(req), params.id)));
  }),
);

/** What the invitee's page shows before they choose a name and password. */
invitationsRouter.get(
  '/:token',
  allow('public'),
  handle({ params: tokenParamSchema }, async ({ params }, _req, res) => {
    const inv = await invitations.usableInvitation(params.token);
    const body: InvitationPreview = {
      email: inv.email,
      role: inv.role,
      inviterName: inv.inviter?.name ?? null,
      expiresAt: inv.expiresAt.toISOString(),
    };
    res.set('Cache-Control', 'no-store').json(body);
  }),
);

invitationsRouter.post(
  '/:token/accept',
  allow('public'),
  handle({ params: tokenParamSchema, body: invitationAcceptSchema }, async ({ params, body }, req, res) => {
    const user = await invitations.acceptInvitation(params.token, body);
    const sessionUser = toSessionUser(user);
    const token = await signIn(req, sessionUser);
    res.status(201).json({ user: sessionUser, csrfToken: token });
  }),
);
