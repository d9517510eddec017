import { Op, type Transaction, fn, col, where } from 'sequelize';
import { passwordProblem } from '../../shared/schemas/password-rules';
import { ValidationError } from '../http/errors';
import { User } from '../db/models';

/** Refuses a new password built on the person's own name or e-mail (NIST SP 800-63B context words). */
export function assertPasswordFits(
  password: string,
  person: { email: string; name?: string },
  field = 'body.password',
) {
  const problem = passwordProblem(password, person);
  if (problem) throw new ValidationError(`${field}: ${problem}`, [{ path: field, message: problem }]);
}

/** The account holding this e-mail, compared case-insensitively (users_email_lower index). */
export function userByEmail(email: string, transaction?: Transaction) {
  return User.findOne({ where: where(fn('lower', col('email')), Op.eq, email.trim().toLowerCase()), transaction });
}
