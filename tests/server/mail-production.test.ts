import { afterAll, describe, expect, it, vi } from 'vitest';

const saved = vi.hoisted(() => {
  const before = { ...process.env };
  process.env.NODE_ENV = 'production';
  process.env.SESSION_SECRET = 'a-test-only-secret-that-is-long-enough-0123456789';
  delete process.env.SMTP_HOST;
  return before;
});

import request from 'supertest';
import { createApp } from '../../server/http/app';
import { sendMail, usesMailCatcher } from '../../server/mail/send';
import { mailCatcherPort } from '../../server/mail/catcher';

const { app, close } = createApp();
afterAll(async () => {
  await close();
  process.env = saved;
});

describe('mail in production', () => {
  it('when NODE_ENV is production, then the inbox route does not exist (404, not 401)', async () => {
    expect(usesMailCatcher()).toBe(false);
    const res = await request(app).get('/api/dev/mailbox');
    expect(res.status).toBe(404);
  });

  it('when no SMTP_HOST is configured, then sending fails with 503 mail_unavailable and no local catcher is started', async () => {
    await expect(sendMail({ to: 'a@test.invalid', subject: 's', text: 't' })).rejects.toMatchObject({
      status: 503,
      code: 'mail_unavailable',
    });
    expect(mailCatcherPort()).toBeNull();
  });
});
