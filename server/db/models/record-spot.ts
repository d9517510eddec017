import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

export type SpotRole = 'target' | 'starting_material' | 'by_product' | 'unknown';
export type SpotLane = 'starting_material' | 'co_spot' | 'mixture';

/** One spot on a plate: its role, Rf (0 < Rf ≤ 1) and, when measured, the distances (mm) it came from. */
export class RecordSpot extends Model<InferAttributes<RecordSpot>, InferCreationAttributes<RecordSpot>> {
  declare id: CreationOptional<number>;
  declare recordId: number;
  /** The record this spot was first contributed to; differs from recordId after a merge. */
  declare originRecordId: number;
  declare position: number;
  declare role: SpotRole;
  declare rf: number;
  declare lane: SpotLane | null;
  declare spotDistanceMm: number | null;
  declare frontDistanceMm: number | null;
  declare label: string | null;
}

RecordSpot.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    recordId: { type: DataTypes.INTEGER, allowNull: false },
    originRecordId: { type: DataTypes.INTEGER, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    role: { type: DataTypes.TEXT, allowNull: false },
    rf: { type: DataTypes.DOUBLE, allowNull: false },
    lane: { type: DataTypes.TEXT, allowNull: true },
    spotDistanceMm: { type: DataTypes.DOUBLE, allowNull: true },
    frontDistanceMm: { type: DataTypes.DOUBLE, allowNull: true },
    label: { type: DataTypes.TEXT, allowNull: true },
  },
  { sequelize, tableName: 'record_spots', modelName: 'RecordSpot', timestamps: false },
);
