import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

export type ImportStatus = 'running' | 'completed' | 'failed' | 'undone';
export type ImportFileFormat = 'csv' | 'sdf' | 'open-tlc' | 'xlsx';

/**
 * One upload of a group's history: the file (SHA-256, bytes in stored_blobs), its mapping, how far the
 * import got and what it added. accepted + rejected + duplicates = processed = lastCommittedRow.
 */
export class Import extends Model<InferAttributes<Import>, InferCreationAttributes<Import>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare fileName: string;
  declare fileSha256: string;
  declare fileBlobKey: string;
  declare byteSize: number;
  declare format: ImportFileFormat;
  declare delimiter: string | null;
  declare headers: string[];
  declare mapping: Record<string, string>;
  declare status: CreationOptional<ImportStatus>;
  declare total: number;
  declare blankRows: number;
  declare processed: CreationOptional<number>;
  declare accepted: CreationOptional<number>;
  declare rejected: CreationOptional<number>;
  declare duplicates: CreationOptional<number>;
  declare newCompounds: CreationOptional<number>;
  declare batchSize: number;
  declare batchesCommitted: CreationOptional<number>;
  declare lastCommittedRow: CreationOptional<number>;
  declare error: CreationOptional<string | null>;
  declare heartbeatAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare finishedAt: CreationOptional<Date | null>;
  declare undoneAt: CreationOptional<Date | null>;
  declare undoneBy: CreationOptional<number | null>;
  declare retiredRecords: CreationOptional<number | null>;
  declare warned: CreationOptional<number>;
  declare sheet: CreationOptional<string | null>;
  declare headerRow: CreationOptional<number | null>;
  declare dateOrder: CreationOptional<'dmy' | 'mdy' | null>;
}

/** A fresh definition per column: Sequelize writes the column name into the object it is given. */
const count = () => ({ type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });

Import.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    userId: { type: DataTypes.INTEGER, allowNull: false },
    fileName: { type: DataTypes.TEXT, allowNull: false },
    fileSha256: { type: DataTypes.TEXT, allowNull: false },
    fileBlobKey: { type: DataTypes.TEXT, allowNull: false },
    byteSize: { type: DataTypes.INTEGER, allowNull: false },
    format: { type: DataTypes.TEXT, allowNull: false },
    delimiter: { type: DataTypes.TEXT, allowNull: true },
    headers: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    mapping: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'running' },
    total: count(),
    blankRows: count(),
    processed: count(),
    accepted: count(),
    rejected: count(),
    duplicates: count(),
    newCompounds: count(),
    batchSize: { type: DataTypes.INTEGER, allowNull: false },
    batchesCommitted: count(),
    lastCommittedRow: count(),
    error: { type: DataTypes.TEXT, allowNull: true },
    heartbeatAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
    finishedAt: { type: DataTypes.DATE, allowNull: true },
    undoneAt: { type: DataTypes.DATE, allowNull: true },
    undoneBy: { type: DataTypes.INTEGER, allowNull: true },
    warned: count(),
    sheet: { type: DataTypes.TEXT, allowNull: true },
    headerRow: { type: DataTypes.INTEGER, allowNull: true },
    dateOrder: { type: DataTypes.TEXT, allowNull: true },
    retiredRecords: { type: DataTypes.INTEGER, allowNull: true },
  },
  { sequelize, tableName: 'imports', modelName: 'Import' },
);
