import { env } from '../../config/env';
import { userByEmail } from '../../auth/account-rules';
import { sendMail } from '../../mail/send';
import { signInGuessedMail } from '../../mail/messages';
import { logger } from '../../http/logger';

/**
 * Tells an account's owner by e-mail that its password is being guessed (NIST SP 800-63B § 5.2.2 suggests
 * notifying the subscriber). Called once per run of failed sign-ins, when the free allowance is used up; an
 * e-mail with no active account gets nothing, and the request that triggered it has already been answered.
 */
export function alertAccountOwner(email: string, failures: number): void {
  (async () => {
    const user = await userByEmail(email);
    if (!user || user.status !== 'active') return;
    await sendMail(
      signInGuessedMail({ to: user.email, failures, at: new Date(), waitSeconds: env().SIGNIN_MAX_WAIT_SECONDS }),
    );
  })().catch((err) => logger.warn({ err }, 'failed sign-in alert not sent'));
}
