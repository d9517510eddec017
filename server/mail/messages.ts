import { env } from '../config/env';
import type { Role } from '../../shared/schemas/auth';
import type { OutgoingMail } from './send';

/** An absolute link into the client, built on APP_URL (in tests, the app's own base URL). */
function appLink(path: string): string {
  return `${env().appUrl.replace(/\/+$/, '')}${path}`;
}

const roleWords: Record<Role, string> = {
  viewer: 'viewer (read and bookmark the group’s records)',
  member: 'member (contribute condition records and edit your own)',
  curator: 'curator (edit any record, merge duplicates, retire, import)',
  admin: 'admin (people, roles and invitations, plus everything a curator does)',
};

const when = (d: Date) => d.toISOString().replace('T', ' ').slice(0, 16) + ' UTC';

export function invitationMail(input: {
  to: string;
  token: string;
  role: Role;
  inviterName: string | null;
  expiresAt: Date;
}): OutgoingMail {
  const link = appLink(`/invitations/${input.token}`);
  const who = input.inviterName ? `${input.inviterName} has invited you` : 'You have been invited';
  return {
    to: input.to,
    subject: 'Your invitation to the group’s Rfolio',
    text: [
      `${who} to the group’s Rfolio, its shared record of how compounds were purified (TLC and flash columns).`,
      '',
      `Your role: ${roleWords[input.role]}.`,
      '',
      'Open this link to choose your name and password:',
      link,
      '',
      `The link works once and until ${when(input.expiresAt)}. If you did not expect it, ignore this message.`,
    ].join('\n'),
  };
}

export function passwordResetMail(input: { to: string; token: string; expiresAt: Date }): OutgoingMail {
  const link = appLink(`/password-reset/${input.token}`);
  return {
    to: input.to,
    subject: 'Set a new Rfolio password',
    text: [
      'Someone (we hope you) asked to set a new password for this address on the group’s Rfolio.',
      '',
      'Open this link to choose a new one:',
      link,
      '',
      `It works once and until ${when(input.expiresAt)}. Setting a new password signs you out everywhere.`,
      'If you did not ask, ignore this message: your password stays as it is.',
    ].join('\n'),
  };
}

export function signInGuessedMail(input: {
  to: string;
  failures: number;
  at: Date;
  waitSeconds: number;
}): OutgoingMail {
  return {
    to: input.to,
    subject: 'Failed sign-ins to your Rfolio account',
    text: [
      `By ${when(input.at)} someone had typed a wrong password for this address on the group’s Rfolio ${input.failures} times in a row.`,
      '',
      `Rfolio now makes each further try wait longer (up to ${input.waitSeconds} s), so you can still sign in; ` +
        'if a sign-in is refused, wait the seconds it says and try again.',
      'If it was you, nothing else is needed. If it was not, nobody has signed in with these guesses; choosing a long',
      `password you use nowhere else keeps it that way (profile page, or ${appLink('/password-reset')}).`,
    ].join('\n'),
  };
}
