import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import type { Role } from '../../../shared/schemas/auth';
import { sequelize } from '../sequelize';

/** An admin's invitation to join with a role; only the SHA-256 of the e-mailed token is stored. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare invitedBy: number | null;
  declare expiresAt: Date;
  declare sentCount: CreationOptional<number>;
  declare lastSentAt: CreationOptional<Date>;
  declare acceptedAt: CreationOptional<Date | null>;
  declare acceptedUserId: CreationOptional<number | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare revokedBy: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Invitation.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    email: { type: DataTypes.TEXT, allowNull: false },
    role: { type: DataTypes.TEXT, allowNull: false },
    tokenHash: { type: DataTypes.TEXT, allowNull: false },
    invitedBy: { type: DataTypes.INTEGER, allowNull: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    sentCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    lastSentAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    acceptedAt: { type: DataTypes.DATE, allowNull: true },
    acceptedUserId: { type: DataTypes.INTEGER, allowNull: true },
    revokedAt: { type: DataTypes.DATE, allowNull: true },
    revokedBy: { type: DataTypes.INTEGER, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'invitations', modelName: 'Invitation' },
);
