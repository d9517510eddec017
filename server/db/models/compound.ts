import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

/** One row per canonical structure (OpenChemLib ID code of the parent structure); see server/chem. */
export class Compound extends Model<InferAttributes<Compound>, InferCreationAttributes<Compound>> {
  declare id: CreationOptional<number>;
  declare idcode: string;
  declare name: string | null;
  declare synonyms: CreationOptional<string[]>;
  declare inputStructure: string;
  declare canonicalSmiles: string;
  declare molfile: string;
  declare formula: string;
  declare mw: number;
  declare exactMass: number;
  declare clogp: number;
  declare tpsa: number;
  declare hbd: number;
  declare hba: number;
  declare rotatableBonds: number;
  declare aromaticRings: number;
  declare stereocentres: number;
  declare charge: number;
  declare classes: CreationOptional<string[]>;
  declare fingerprint: CreationOptional<Buffer | null>;
  declare createdBy: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

Compound.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    idcode: { type: DataTypes.TEXT, allowNull: false, unique: true },
    name: DataTypes.TEXT,
    synonyms: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
    inputStructure: { type: DataTypes.TEXT, allowNull: false },
    canonicalSmiles: { type: DataTypes.TEXT, allowNull: false },
    molfile: { type: DataTypes.TEXT, allowNull: false },
    formula: { type: DataTypes.TEXT, allowNull: false },
    mw: { type: DataTypes.DOUBLE, allowNull: false },
    exactMass: { type: DataTypes.DOUBLE, allowNull: false },
    clogp: { type: DataTypes.DOUBLE, allowNull: false },
    tpsa: { type: DataTypes.DOUBLE, allowNull: false },
    hbd: { type: DataTypes.INTEGER, allowNull: false },
    hba: { type: DataTypes.INTEGER, allowNull: false },
    rotatableBonds: { type: DataTypes.INTEGER, allowNull: false },
    aromaticRings: { type: DataTypes.INTEGER, allowNull: false },
    stereocentres: { type: DataTypes.INTEGER, allowNull: false },
    charge: { type: DataTypes.INTEGER, allowNull: false },
    classes: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
    fingerprint: { type: DataTypes.BLOB, allowNull: true },
    createdBy: { type: DataTypes.INTEGER, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'compounds', modelName: 'Compound' },
);
