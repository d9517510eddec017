import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

export class AuditEntry extends Model<InferAttributes<AuditEntry>, InferCreationAttributes<AuditEntry>> {
  declare id: CreationOptional<number>;
  declare actorId: number | null;
  declare action: string;
  declare subjectType: string;
  declare subjectId: string | null;
  declare details: CreationOptional<Record<string, unknown>>;
  declare createdAt: CreationOptional<Date>;
}

AuditEntry.init(
  {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    actorId: DataTypes.INTEGER,
    action: { type: DataTypes.TEXT, allowNull: false },
    subjectType: { type: DataTypes.TEXT, allowNull: false },
    subjectId: DataTypes.TEXT,
    details: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'audit_log', modelName: 'AuditEntry', updatedAt: false },
);
