import type { Transaction } from 'sequelize';
import { User } from '../server/db/models';
import { hashPassword } from '../server/auth/passwords';
import type { Role } from '../shared/schemas/auth';
import { env } from '../server/config/env';

/** The invented group's four sign-ins, one per role. */
const people: { email: string; name: string; role: Role }[] = [
  { email: 'admin@example.org', name: 'Ada Quillfeather (demo)', role: 'admin' },
  { email: 'curator@example.org', name: 'Corin Vale (demo)', role: 'curator' },
  { email: 'member@example.org', name: 'Mira Okonkwo-Lindqvist (demo)', role: 'member' },
  { email: 'viewer@example.org', name: 'Viktor Ashgrove (demo)', role: 'viewer' },
];

export function demoAccounts() {
  return people.map((p) => ({ ...p, password: env().RFOLIO_DEMO_PASSWORD }));
}

export async function seedDemoUsers(password: string, transaction: Transaction) {
  const passwordHash = await hashPassword(password);
  for (const p of people) {
    await User.findOrCreate({ where: { email: p.email }, defaults: { ...p, passwordHash }, transaction });
  }
}
