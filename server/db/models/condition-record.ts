import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';
import type { Eluent } from '../../../shared/schemas/eluent';

export type Technique = 'tlc' | 'flash' | 'prep_tlc';
export type Outcome = 'clean' | 'partial' | 'failed';
export type RecordStatus = 'active' | 'merged' | 'retired';

/**
 * What a chemist recorded after a TLC plate or a column: compound, phase, eluent, spots (RecordSpot),
 * visualisations, outcome, column details. `solventKeys`, `additiveKeys`, `eluentMode`, `strongPercent`
 * and `targetRf` are kept in step with `eluent` and the spots by the records service, for filters and sorts.
 */
export class ConditionRecord extends Model<InferAttributes<ConditionRecord>, InferCreationAttributes<ConditionRecord>> {
  declare id: CreationOptional<number>;
  declare compoundId: number;
  declare authorId: number;
  declare technique: Technique;
  declare stationaryPhase: string;
  declare stationaryPhaseOther: string | null;
  declare eluent: Eluent;
  declare solventKeys: string[];
  declare additiveKeys: string[];
  declare eluentMode: 'isocratic' | 'gradient';
  declare strongPercent: number | null;
  declare targetRf: number | null;
  declare outcome: Outcome;
  declare outcomeReason: string | null;
  declare columnDiameterMm: number | null;
  declare cartridgeSize: string | null;
  declare silicaG: number | null;
  declare sampleMg: number | null;
  declare loadMethod: 'dry' | 'liquid' | null;
  declare fractionMl: number | null;
  declare fractionsPooled: string | null;
  declare yieldPercent: number | null;
  declare purityNote: string | null;
  declare notebookRef: string | null;
  /** The day the plate was run (YYYY-MM-DD), when given. */
  declare runOn: CreationOptional<string | null>;
  declare notes: string | null;
  /** Who a sheet said recorded it, when no member matched (imports). */
  declare recordedBy: CreationOptional<string | null>;
  /** Texts an import only partly recognised, as written (field → text). */
  declare sourceTexts: CreationOptional<Record<string, string> | null>;
  declare status: CreationOptional<RecordStatus>;
  declare mergedIntoId: CreationOptional<number | null>;
  declare retiredReason: CreationOptional<string | null>;
  declare retiredAt: CreationOptional<Date | null>;
  declare retiredBy: CreationOptional<number | null>;
  declare importId: CreationOptional<number | null>;
  declare contentHash: string;
  declare demo: CreationOptional<boolean>;
  declare revision: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** Fresh definitions each time: Sequelize writes into an attribute's definition object, so none may be shared. */
const number = () => ({ type: DataTypes.DOUBLE, allowNull: true });
const text = () => ({ type: DataTypes.TEXT, allowNull: true });

ConditionRecord.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    compoundId: { type: DataTypes.INTEGER, allowNull: false },
    authorId: { type: DataTypes.INTEGER, allowNull: false },
    technique: { type: DataTypes.TEXT, allowNull: false },
    stationaryPhase: { type: DataTypes.TEXT, allowNull: false },
    stationaryPhaseOther: text(),
    eluent: { type: DataTypes.JSONB, allowNull: false },
    solventKeys: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
    additiveKeys: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
    eluentMode: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'isocratic' },
    strongPercent: number(),
    targetRf: number(),
    outcome: { type: DataTypes.TEXT, allowNull: false },
    outcomeReason: text(),
    columnDiameterMm: number(),
    cartridgeSize: text(),
    silicaG: number(),
    sampleMg: number(),
    loadMethod: text(),
    fractionMl: number(),
    fractionsPooled: text(),
    yieldPercent: number(),
    purityNote: text(),
    notebookRef: text(),
    runOn: { type: DataTypes.DATEONLY, allowNull: true },
    notes: text(),
    recordedBy: text(),
    sourceTexts: { type: DataTypes.JSONB, allowNull: true },
    status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'active' },
    mergedIntoId: { type: DataTypes.INTEGER, allowNull: true },
    retiredReason: text(),
    retiredAt: { type: DataTypes.DATE, allowNull: true },
    retiredBy: { type: DataTypes.INTEGER, allowNull: true },
    importId: { type: DataTypes.INTEGER, allowNull: true },
    contentHash: { type: DataTypes.TEXT, allowNull: false },
    demo: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'condition_records', modelName: 'ConditionRecord' },
);
