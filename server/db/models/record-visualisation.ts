import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

/** How a plate was made visible: a stain catalogue key (uv-254, kmno4, iodine, …) or 'other' with a note. */
export class RecordVisualisation extends Model<
  InferAttributes<RecordVisualisation>,
  InferCreationAttributes<RecordVisualisation>
> {
  declare id: CreationOptional<number>;
  declare recordId: number;
  /** The record this row was first contributed to; differs from recordId after a merge. */
  declare originRecordId: number;
  declare position: number;
  declare method: string;
  declare note: string | null;
}

RecordVisualisation.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    recordId: { type: DataTypes.INTEGER, allowNull: false },
    originRecordId: { type: DataTypes.INTEGER, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    method: { type: DataTypes.TEXT, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
  },
  { sequelize, tableName: 'record_visualisations', modelName: 'RecordVisualisation', timestamps: false },
);
