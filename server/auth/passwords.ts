import bcrypt from 'bcryptjs';

/** bcrypt cost 11 (~150 ms in bcryptjs on this class of machine); tests may lower it through BCRYPT_COST. */
const cost = Number(process.env.BCRYPT_COST ?? (process.env.NODE_ENV === 'test' ? 4 : 11));

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, cost);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}

/** A real hash of a random secret, compared against when an e-mail is unknown so timing does not tell. */
export const dummyHash = bcrypt.hashSync(Math.random().toString(36), cost);
