import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '../config/env';
import { AppError } from '../http/errors';
import { mailCatcherPort } from './mailbox';

export type OutgoingMail = { to: string; subject: string; text: string; html?: string };

/** True where the local mail catcher replaces a real SMTP relay: everywhere but production. */
export function usesMailCatcher(): boolean {
  return env().NODE_ENV !== 'production';
}

let relay: Transporter | undefined;
let catcherTransport: { port: number; transport: Transporter } | undefined;

async function transport(): Promise<Transporter> {
  if (!usesMailCatcher()) {
    const { SMTP_HOST, SMTP_PORT, SMTP_USER, SMTP_PASSWORD, SMTP_SECURE } = env();
    if (!SMTP_HOST) throw new AppError(503, 'mail_unavailable', 'Outgoing mail is not configured (SMTP_HOST).');
    relay ??= nodemailer.createTransport({
      host: SMTP_HOST,
      port: SMTP_PORT ?? 587,
      secure: SMTP_SECURE === '1',
      auth: SMTP_USER ? { user: SMTP_USER, pass: SMTP_PASSWORD ?? '' } : undefined,
    });
    return relay;
  }
  const port = mailCatcherPort() ?? (await (await import('./catcher')).startMailCatcher(env().MAIL_CATCHER_PORT));
  if (catcherTransport?.port !== port) {
    catcherTransport = {
      port,
      transport: nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true }),
    };
  }
  return catcherTransport.transport;
}

/** Sends one message through nodemailer over SMTP: the configured relay in production, the local catcher elsewhere. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  const t = await transport();
  await t.sendMail({ from: env().MAIL_FROM, ...mail });
}
