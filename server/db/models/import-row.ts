import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

/** A row an import rejected: its original cells (header → text), where it was and why it was refused. */
export class ImportRow extends Model<InferAttributes<ImportRow>, InferCreationAttributes<ImportRow>> {
  declare id: CreationOptional<number>;
  declare importId: number;
  declare rowNumber: number;
  declare line: number;
  declare cells: Record<string, string>;
  declare reason: string;
  /** 'rejected': the row was not imported; 'warning': it was, and `reason` says what was only partly read. */
  declare kind: CreationOptional<'rejected' | 'warning'>;
}

ImportRow.init(
  {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    importId: { type: DataTypes.INTEGER, allowNull: false },
    rowNumber: { type: DataTypes.INTEGER, allowNull: false },
    line: { type: DataTypes.INTEGER, allowNull: false },
    cells: { type: DataTypes.JSONB, allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    kind: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'rejected' },
  },
  { sequelize, tableName: 'import_rows', modelName: 'ImportRow', timestamps: false },
);
