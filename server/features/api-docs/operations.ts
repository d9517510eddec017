import { z } from 'zod';
import { created, fileField, noContent, ok, type OperationText } from './operation-helpers';
import { workflowOperations } from './operations-workflows';
import { apiErrorSchema, healthSchema } from '../../../shared/schemas/common';
import { meResponseSchema, signedInResponseSchema } from '../../../shared/schemas/auth';
import {
  adminUserListSchema,
  adminUserSchema,
  invitationListSchema,
  invitationPreviewSchema,
  invitationSchema,
  mailboxSchema,
  resetPreviewSchema,
} from '../../../shared/schemas/accounts';
import { apiTokenListSchema, apiTokenSchema, createdTokenSchema } from '../../../shared/schemas/tokens';
import { photoDtoSchema, recordDtoSchema, recordPageSchema } from '../../../shared/schemas/record-dto';
import { recordHistorySchema } from '../../../shared/schemas/record-history';
import { compoundDetailSchema, compoundPageSchema, structureParseResultSchema } from '../../../shared/schemas/compound';
import { statusChangeResultSchema } from '../../../shared/schemas/curation-dto';
import { scoutResultSchema } from '../../../shared/schemas/scout';
import { columnPlanResultSchema, translateEluentResultSchema } from '../../../shared/schemas/tools';
import { searchContributorsSchema, searchResponseSchema } from '../../../shared/schemas/search';
import { bookmarkDtoSchema, bookmarkListSchema, bookmarkTargetSchema } from '../../../shared/schemas/bookmark';
import { classDetailSchema, classIndexSchema } from '../../../shared/schemas/classes';
import { overviewSchema } from '../../../shared/schemas/overview';

/* Small answers that have no shared schema of their own (each is written in exactly one route). */
const csrfAnswerSchema = z.object({ token: z.string() });
const messageSchema = z.object({ message: z.string() });

export { apiErrorSchema };
export type { OperationText };

/**
 * Every documented operation, keyed "METHOD /api/path" as Express mounts it (path parameters in braces).
 * A mounted route missing here fails tests/server/openapi.test.ts.
 */
export const operations: Record<string, OperationText> = {
  'GET /api/health': {
    tag: 'Service',
    summary: 'Health of the app and its database',
    answers: [ok(healthSchema, 'Up.'), { status: 503, description: 'The database is down.', json: healthSchema }],
  },
  'GET /api/openapi.json': {
    tag: 'Service',
    summary: 'This OpenAPI document',
    answers: [{ status: 200, description: 'The document.', media: { type: 'application/json' } }],
  },

  'GET /api/auth/csrf': {
    tag: 'Session',
    summary: "The session's CSRF token (send it as X-CSRF-Token on writes with a cookie)",
    answers: [ok(csrfAnswerSchema)],
  },
  'GET /api/auth/me': {
    tag: 'Session',
    summary: 'Who is calling (null when nobody is signed in)',
    answers: [ok(meResponseSchema)],
  },
  'POST /api/auth/login': {
    tag: 'Session',
    summary: 'Sign in with e-mail and password (starts a cookie session)',
    description: 'Failed sign-ins are throttled per address and per account (429).',
    answers: [ok(signedInResponseSchema)],
  },
  'POST /api/auth/logout': { tag: 'Session', summary: 'Sign out (ends the cookie session)', answers: [noContent()] },
  'PATCH /api/auth/me': { tag: 'Profile', summary: 'Change your name', answers: [ok(meResponseSchema)] },
  'POST /api/auth/me/password': {
    tag: 'Profile',
    summary: 'Change your password (ends your other sessions)',
    answers: [noContent()],
  },
  'POST /api/auth/password-reset': {
    tag: 'Session',
    summary: 'Ask for a password-reset e-mail',
    answers: [
      {
        status: 202,
        description: 'Accepted (the same answer whether or not the address has an account).',
        json: messageSchema,
      },
    ],
  },
  'GET /api/auth/password-reset/{token}': {
    tag: 'Session',
    summary: 'Check a password-reset link',
    answers: [ok(resetPreviewSchema)],
  },
  'POST /api/auth/password-reset/{token}': {
    tag: 'Session',
    summary: 'Set a new password with a reset link',
    answers: [noContent()],
  },
  'GET /api/auth/invitations/{token}': {
    tag: 'Session',
    summary: 'Check an invitation link',
    answers: [ok(invitationPreviewSchema)],
  },
  'POST /api/auth/invitations/{token}/accept': {
    tag: 'Session',
    summary: 'Accept an invitation (creates the account, signs in)',
    answers: [created(signedInResponseSchema)],
  },

  'GET /api/auth/invitations': { tag: 'People', summary: 'List invitations', answers: [ok(invitationListSchema)] },
  'POST /api/auth/invitations': {
    tag: 'People',
    summary: 'Invite someone by e-mail',
    answers: [created(invitationSchema)],
  },
  'POST /api/auth/invitations/{id}/resend': {
    tag: 'People',
    summary: 'Send an invitation again',
    answers: [ok(invitationSchema)],
  },
  'POST /api/auth/invitations/{id}/revoke': {
    tag: 'People',
    summary: 'Withdraw an invitation',
    answers: [ok(invitationSchema)],
  },
  'GET /api/admin/users': { tag: 'People', summary: 'Everyone in the group', answers: [ok(adminUserListSchema)] },
  'GET /api/admin/users/{id}': { tag: 'People', summary: 'One person', answers: [ok(adminUserSchema)] },
  'PATCH /api/admin/users/{id}': {
    tag: 'People',
    summary: "Change a person's role or status (disabling ends their sessions and stops their tokens)",
    answers: [ok(adminUserSchema)],
  },
  'GET /api/dev/mailbox': {
    tag: 'Service',
    summary: 'Mail caught by the development mail catcher (not mounted in production)',
    answers: [ok(mailboxSchema)],
  },

  'GET /api/tokens': {
    tag: 'API tokens',
    summary: 'Your personal API tokens (revoked and expired ones included)',
    answers: [ok(apiTokenListSchema)],
  },
  'POST /api/tokens': {
    tag: 'API tokens',
    summary: 'Create a personal API token',
    description:
      'The secret is in this answer only; the server keeps its SHA-256 hash. ' +
      'Needs a signed-in session: a token cannot create tokens.',
    answers: [created(createdTokenSchema)],
  },
  'DELETE /api/tokens/{id}': {
    tag: 'API tokens',
    summary: "Revoke a token (your own; admins: anyone's)",
    answers: [ok(apiTokenSchema, 'Revoked (revoking twice is harmless).')],
  },
  'GET /api/admin/tokens': {
    tag: 'API tokens',
    summary: 'Every personal API token in the group',
    answers: [ok(apiTokenListSchema)],
  },

  'GET /api/records': {
    tag: 'Records',
    summary: 'List condition records (filters, sort, pages)',
    answers: [ok(recordPageSchema)],
  },
  'POST /api/records': {
    tag: 'Records',
    summary: 'Contribute a condition record',
    answers: [created(recordDtoSchema)],
  },
  'GET /api/records/{id}': { tag: 'Records', summary: 'One condition record', answers: [ok(recordDtoSchema)] },
  'PATCH /api/records/{id}': {
    tag: 'Records',
    summary: 'Edit a record (author, curators and admins)',
    answers: [ok(recordDtoSchema)],
  },
  'GET /api/records/{id}/history': {
    tag: 'Records',
    summary: "A record's revisions",
    answers: [ok(recordHistorySchema)],
  },
  'POST /api/records/{id}/retire': {
    tag: 'Records',
    summary: 'Retire a record with a reason',
    answers: [ok(statusChangeResultSchema)],
  },
  'POST /api/records/{id}/restore': {
    tag: 'Records',
    summary: 'Restore a retired record',
    answers: [ok(statusChangeResultSchema)],
  },
  'POST /api/records/{id}/photos': {
    tag: 'Records',
    summary: 'Add a plate photo to a record',
    answers: [created(photoDtoSchema)],
    extra: { multipart: z.object({ photo: fileField('A JPEG, PNG or WebP image.') }) },
  },
  'GET /api/photos/{id}': {
    tag: 'Records',
    summary: 'A plate photo (full size or thumbnail)',
    answers: [{ status: 200, description: 'The image.', media: { type: 'image/*', format: 'binary' } }],
  },
  'DELETE /api/photos/{id}': { tag: 'Records', summary: 'Remove a photo', answers: [noContent()] },

  'GET /api/compounds': { tag: 'Compounds', summary: 'List compounds', answers: [ok(compoundPageSchema)] },
  'GET /api/compounds/{id}': {
    tag: 'Compounds',
    summary: 'One compound with its records',
    answers: [ok(compoundDetailSchema)],
  },
  'GET /api/compounds/{id}/svg': {
    tag: 'Compounds',
    summary: 'The structure drawn as SVG',
    answers: [{ status: 200, description: 'The drawing.', media: { type: 'image/svg+xml' } }],
  },
  'POST /api/structures/parse': {
    tag: 'Compounds',
    summary: 'Read a SMILES or molfile: identity, descriptors, classes',
    answers: [ok(structureParseResultSchema)],
  },

  'GET /api/search': {
    tag: 'Search',
    summary: 'Search records and compounds (text, structure, filters)',
    answers: [ok(searchResponseSchema)],
  },
  'GET /api/search/contributors': {
    tag: 'Search',
    summary: 'People who contributed records (for the filter)',
    answers: [ok(searchContributorsSchema)],
  },
  'GET /api/export.csv': {
    tag: 'Search',
    summary: 'Export the records a search finds as CSV',
    answers: [{ status: 200, description: 'CSV, one row per record.', media: { type: 'text/csv' } }],
  },
  'GET /api/export.sdf': {
    tag: 'Search',
    summary: 'Export the records a search finds as SDF',
    answers: [{ status: 200, description: 'SDF, one entry per record.', media: { type: 'chemical/x-mdl-sdfile' } }],
  },
  'POST /api/scout': {
    tag: 'Scout',
    summary: 'Ask for starting conditions for a compound',
    answers: [ok(scoutResultSchema)],
  },
  'POST /api/tools/column-plan': {
    tag: 'Tools',
    summary: 'Plan a flash column from a TLC Rf',
    answers: [ok(columnPlanResultSchema)],
  },
  'POST /api/tools/translate-eluent': {
    tag: 'Tools',
    summary: 'Translate an eluent into another solvent pair of similar strength',
    answers: [ok(translateEluentResultSchema)],
  },
  'GET /api/classes': {
    tag: 'Classes',
    summary: 'Compound classes with their counts',
    answers: [ok(classIndexSchema)],
  },
  'GET /api/classes/{key}': {
    tag: 'Classes',
    summary: 'One compound class: eluents and Rf seen',
    answers: [ok(classDetailSchema)],
  },
  'GET /api/overview': {
    tag: 'Classes',
    summary: "The group's overview (counts, recent records)",
    answers: [ok(overviewSchema)],
  },

  'GET /api/bookmarks': { tag: 'Bookmarks', summary: 'Your bookmarks', answers: [ok(bookmarkListSchema)] },
  'POST /api/bookmarks': {
    tag: 'Bookmarks',
    summary: 'Bookmark a record or compound',
    answers: [created(bookmarkDtoSchema)],
  },
  'PATCH /api/bookmarks/{id}': {
    tag: 'Bookmarks',
    summary: "Change a bookmark's note",
    answers: [ok(bookmarkDtoSchema)],
  },
  'DELETE /api/bookmarks/{id}': { tag: 'Bookmarks', summary: 'Remove a bookmark', answers: [noContent()] },
  'DELETE /api/bookmarks': {
    tag: 'Bookmarks',
    summary: 'Remove the bookmark of a record or compound',
    answers: [noContent()],
    extra: { query: bookmarkTargetSchema },
  },

  ...workflowOperations,
};
