import { caughtMail, waitForMail } from '../../server/mail/mailbox';
import type { CaughtMail } from '../../shared/schemas/accounts';

/** The id of the newest message the local mail catcher holds (0 when empty), to wait for later ones. */
export function lastMailId(): number {
  return caughtMail()[0]?.id ?? 0;
}

/** Waits for a message to this address newer than `afterId` and returns it with the link under `path`. */
export async function mailedLink(to: string, path: '/invitations/' | '/password-reset/', afterId = 0) {
  const mail: CaughtMail = await waitForMail(
    (m) => m.id > afterId && m.to.includes(to) && m.links.some((l) => l.includes(path)),
  );
  const link = mail.links.find((l) => l.includes(path))!;
  return { mail, link, token: link.slice(link.indexOf(path) + path.length) };
}
