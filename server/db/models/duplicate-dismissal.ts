import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

/**
 * A curator's "these are not duplicates": hides the candidate group whose signature (sorted record ids,
 * each with its revision and updated_at) matches, so any change to one of the records brings it back.
 */
export class DuplicateDismissal extends Model<
  InferAttributes<DuplicateDismissal>,
  InferCreationAttributes<DuplicateDismissal>
> {
  declare id: CreationOptional<number>;
  declare recordIds: number[];
  declare signature: string;
  declare reason: string;
  declare actorId: number;
  declare at: CreationOptional<Date>;
}

DuplicateDismissal.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    recordIds: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false },
    signature: { type: DataTypes.TEXT, allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    actorId: { type: DataTypes.INTEGER, allowNull: false },
    at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  },
  {
    sequelize,
    tableName: 'duplicate_dismissals',
    modelName: 'DuplicateDismissal',
    timestamps: false,
    underscored: true,
  },
);
