import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import { keepMail, noteMailCatcherPort } from './mailbox';
import { logger } from '../http/logger';

/**
 * The local mail catcher: an SMTP server of the app's own on loopback (smtp-server) that keeps every
 * message it receives in memory, for development, the demo and tests. Never started in production, and never
 * imported there either (smtp-server and mailparser are development dependencies): load it with `import()`.
 */
let server: SMTPServer | undefined;
let starting: Promise<number> | undefined;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
}

const LINK = /https?:\/\/[^\s<>"')]+/g;

export function startMailCatcher(wantedPort = 0): Promise<number> {
  starting ??= new Promise<number>((resolve, reject) => {
    const smtp = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      size: 5 * 1024 * 1024,
      onData(stream, _session, callback) {
        simpleParser(stream)
          .then((parsed) => {
            const text = parsed.text ?? '';
            keepMail({
              receivedAt: new Date().toISOString(),
              from: addresses(parsed.from)[0] ?? '',
              to: addresses(parsed.to),
              subject: parsed.subject ?? '',
              text,
              links: [...new Set(text.match(LINK) ?? [])],
            });
            callback();
          })
          .catch((err: Error) => callback(err));
      },
    });
    smtp.on('error', (err) => logger.warn({ err }, 'mail catcher error'));
    smtp.listen(wantedPort, '127.0.0.1', () => {
      server = smtp;
      const port = (smtp.server.address() as AddressInfo).port;
      noteMailCatcherPort(port);
      resolve(port);
    });
    smtp.server.once('error', reject);
  });
  return starting;
}

export { mailCatcherPort } from './mailbox';

export async function stopMailCatcher(): Promise<void> {
  const running = server;
  server = undefined;
  starting = undefined;
  noteMailCatcherPort(null);
  if (running) await new Promise<void>((resolve) => running.close(() => resolve()));
}
