import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

/** A user's bookmark of a record or of a compound (exactly one of `recordId`, `compoundId`), with an optional note. */
export class Bookmark extends Model<InferAttributes<Bookmark>, InferCreationAttributes<Bookmark>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare recordId: number | null;
  declare compoundId: number | null;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Bookmark.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    userId: { type: DataTypes.INTEGER, allowNull: false },
    recordId: { type: DataTypes.INTEGER, allowNull: true },
    compoundId: { type: DataTypes.INTEGER, allowNull: true },
    note: { type: DataTypes.TEXT, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'bookmarks', modelName: 'Bookmark' },
);
