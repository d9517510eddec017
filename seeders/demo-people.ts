import type { Transaction } from 'sequelize';
import { User } from '../server/db/models';
import { hashPassword } from '../server/auth/passwords';

/** The invented group's bench chemists (role member). Every name is fictional and marked "(demo)". */
const benchChemists = [
  { email: 'tomasz.brightwater@example.org', name: 'Tomasz Brightwater (demo)' },
  { email: 'imke.saltmarsh@example.org', name: 'Imke Saltmarsh (demo)' },
  { email: 'rafael.oduya-kemp@example.org', name: 'Rafael Oduya-Kemp (demo)' },
  { email: 'lin.harrowgate@example.org', name: 'Lin Harrowgate (demo)' },
  { email: 'sunniva.draycott@example.org', name: 'Sunniva Draycott (demo)' },
  { email: 'kwame.eldergrove@example.org', name: 'Kwame Eldergrove (demo)' },
];

/**
 * Creates the bench chemists (they sign in with the demo password) and returns the ids of everyone who
 * authors demo records: these six plus the demo member and curator accounts.
 */
export async function seedDemoPeople(password: string, transaction: Transaction): Promise<number[]> {
  const passwordHash = await hashPassword(password);
  const ids: number[] = [];
  for (const person of benchChemists) {
    const [user] = await User.findOrCreate({
      where: { email: person.email },
      defaults: { ...person, role: 'member', passwordHash },
      transaction,
    });
    ids.push(user.id);
  }
  for (const email of ['member@example.org', 'curator@example.org']) {
    const user = await User.findOne({ where: { email }, transaction });
    if (user) ids.push(user.id);
  }
  return ids;
}
