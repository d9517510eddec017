import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

export type ContributorRole = 'author' | 'editor' | 'merged-from';

/**
 * Who is credited on a record: its author, people who edited it, and — after a merge — the authors
 * of the merged records (`viaRecordId` names which), so a merge never drops anyone's credit.
 */
export class RecordContributor extends Model<
  InferAttributes<RecordContributor>,
  InferCreationAttributes<RecordContributor>
> {
  declare id: CreationOptional<number>;
  declare recordId: number;
  declare userId: number;
  declare role: ContributorRole;
  declare viaRecordId: number | null;
  declare createdAt: CreationOptional<Date>;
}

RecordContributor.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    recordId: { type: DataTypes.INTEGER, allowNull: false },
    userId: { type: DataTypes.INTEGER, allowNull: false },
    role: { type: DataTypes.TEXT, allowNull: false },
    viaRecordId: { type: DataTypes.INTEGER, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'record_contributors', modelName: 'RecordContributor', updatedAt: false },
);
