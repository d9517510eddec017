// Every model is initialised in its own file; associations live here, in one place.
import { User } from './user';
import { Compound } from './compound';
import { AuditEntry } from './audit-entry';

Compound.belongsTo(User, { as: 'creator', foreignKey: 'createdBy' });
AuditEntry.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });

export { User, Compound, AuditEntry };
