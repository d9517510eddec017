import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

/** Bytes kept in PostgreSQL, addressed by their SHA-256; used only through server/storage. */
export class StoredBlob extends Model<InferAttributes<StoredBlob>, InferCreationAttributes<StoredBlob>> {
  declare key: string;
  declare bytes: Buffer;
  declare contentType: string;
  declare byteSize: number;
  declare createdAt: CreationOptional<Date>;
}

StoredBlob.init(
  {
    key: { type: DataTypes.TEXT, primaryKey: true },
    bytes: { type: DataTypes.BLOB, allowNull: false },
    contentType: { type: DataTypes.TEXT, allowNull: false },
    byteSize: { type: DataTypes.INTEGER, allowNull: false },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'stored_blobs', modelName: 'StoredBlob', updatedAt: false },
);
