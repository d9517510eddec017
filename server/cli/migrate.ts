import { migrator } from '../db/migrator';
import { sequelize } from '../db/sequelize';

const direction = process.argv[2] ?? 'up';
const done = direction === 'down' ? await migrator.down() : await migrator.up();
console.log(
  `${direction === 'down' ? 'Reverted' : 'Applied'} ${done.length} ` +
    `migration(s)${done.length ? ': ' + done.map((m) => m.name).join(', ') : ''}`,
);
await sequelize.close();
