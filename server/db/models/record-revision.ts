import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';
import type { FieldChange, RevisionAction } from '../../../shared/schemas/record-history';

/**
 * One change to a record: who, when, what (field-level `changes`) and the record as it stood after
 * the change (`snapshot`, the record DTO without photos' bytes). Number 1 is the creation.
 */
export class RecordRevision extends Model<InferAttributes<RecordRevision>, InferCreationAttributes<RecordRevision>> {
  declare id: CreationOptional<number>;
  declare recordId: number;
  declare number: number;
  declare authorId: number | null;
  declare action: RevisionAction;
  declare changes: FieldChange[];
  declare snapshot: Record<string, unknown>;
  declare at: CreationOptional<Date>;
}

RecordRevision.init(
  {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    recordId: { type: DataTypes.INTEGER, allowNull: false },
    number: { type: DataTypes.INTEGER, allowNull: false },
    authorId: { type: DataTypes.INTEGER, allowNull: true },
    action: { type: DataTypes.TEXT, allowNull: false },
    changes: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    snapshot: { type: DataTypes.JSONB, allowNull: false },
    at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  },
  { sequelize, tableName: 'record_revisions', modelName: 'RecordRevision', timestamps: false },
);
