import { afterAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { createApp } from '../../server/http/app';
import { sendMail } from '../../server/mail/send';
import { agentFor } from '../helpers/agent';
import { lastMailId, mailedLink } from '../helpers/mail';

const { app, close } = createApp();
afterAll(close);

describe('GET /api/dev/mailbox (outside production)', () => {
  it(
    'when a message goes out through nodemailer, then the local SMTP server keeps it and an admin ' +
      'reads it over HTTP with its links',
    async () => {
      const to = `mailbox-${randomUUID().slice(0, 8)}@test.invalid`;
      const before = lastMailId();
      await sendMail({
        to,
        subject: 'Plate photo ready',
        text: 'See http://127.0.0.1:1/password-reset/abcdefghijklmnopqrstuvwxyz0123456789ABCDEFG today.',
      });
      await mailedLink(to, '/password-reset/', before);
      const admin = await agentFor(app, 'admin');
      const res = await admin.get('/api/dev/mailbox');
      expect(res.status).toBe(200);
      expect(res.body.smtpPort).toEqual(expect.any(Number));
      const mail = res.body.items.find((m: { to: string[] }) => m.to.includes(to));
      expect(mail).toMatchObject({ subject: 'Plate photo ready', from: 'no-reply@rfolio.invalid' });
      expect(mail.links).toEqual(['http://127.0.0.1:1/password-reset/abcdefghijklmnopqrstuvwxyz0123456789ABCDEFG']);
    },
  );

  it('when a curator or anonymous asks, then 403 and 401', async () => {
    expect((await (await agentFor(app, 'curator')).get('/api/dev/mailbox')).status).toBe(403);
    expect((await (await agentFor(app)).get('/api/dev/mailbox')).status).toBe(401);
  });
});
