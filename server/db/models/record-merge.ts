import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

/** Row dumps (PostgreSQL to_jsonb) of every row a merge touched, per table, taken just before it. */
export type MergeSnapshot = Record<string, Record<string, unknown>[]>;

/** Rows a merge inserted or deleted, so an unmerge can take them back out or put them back. */
export interface MergeEffects {
  insertedContributorIds: number[];
  deletedBookmarkIds: number[];
  /** Deleted bookmark id → id of the survivor's bookmark of the same user it was united into. */
  bookmarkUnitedInto: Record<string, number>;
  /** Notes of the survivor's bookmarks right after the merge appended to them, by bookmark id. */
  bookmarkNotesAfter: Record<string, string | null>;
  revisionIds: number[];
}

/**
 * One merge of condition records into a survivor: the field choices, the before-snapshot that lets an
 * unmerge restore every row exactly, per-record digests right after the merge, and who undid it when.
 */
export class RecordMerge extends Model<InferAttributes<RecordMerge>, InferCreationAttributes<RecordMerge>> {
  declare id: CreationOptional<number>;
  declare survivorId: number;
  declare mergedIds: number[];
  /** Field name → id of the record the survivor took it from. */
  declare fields: CreationOptional<Record<string, number>>;
  declare before: MergeSnapshot;
  declare afterDigests: CreationOptional<Record<string, string>>;
  declare effects: CreationOptional<MergeEffects | Record<string, never>>;
  declare actorId: number;
  declare at: CreationOptional<Date>;
  declare undoneAt: CreationOptional<Date | null>;
  declare undoneBy: CreationOptional<number | null>;
}

RecordMerge.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    survivorId: { type: DataTypes.INTEGER, allowNull: false },
    mergedIds: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false },
    fields: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    before: { type: DataTypes.JSONB, allowNull: false },
    afterDigests: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    effects: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    actorId: { type: DataTypes.INTEGER, allowNull: false },
    at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    undoneAt: { type: DataTypes.DATE, allowNull: true },
    undoneBy: { type: DataTypes.INTEGER, allowNull: true },
  },
  { sequelize, tableName: 'record_merges', modelName: 'RecordMerge', timestamps: false, underscored: true },
);
