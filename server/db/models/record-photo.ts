import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes } from 'sequelize';
import { sequelize } from '../sequelize';

export type PhotoContentType = 'image/jpeg' | 'image/png' | 'image/webp';

/**
 * A plate photo's metadata; the image and its thumbnail live in blob storage (server/storage) under
 * `blobKey` / `thumbKey`. Removing a photo sets `removedAt`; the bytes stay, so nothing is lost.
 */
export class RecordPhoto extends Model<InferAttributes<RecordPhoto>, InferCreationAttributes<RecordPhoto>> {
  declare id: CreationOptional<number>;
  declare recordId: number;
  /** The record this photo was first added to; differs from recordId after a merge. */
  declare originRecordId: number;
  declare uploadedBy: number;
  declare blobKey: string;
  declare thumbKey: string;
  declare contentType: PhotoContentType;
  declare byteSize: number;
  declare width: number;
  declare height: number;
  declare sha256: string;
  declare originalName: string | null;
  declare caption: string | null;
  declare removedAt: CreationOptional<Date | null>;
  declare removedBy: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
}

RecordPhoto.init(
  {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    recordId: { type: DataTypes.INTEGER, allowNull: false },
    originRecordId: { type: DataTypes.INTEGER, allowNull: false },
    uploadedBy: { type: DataTypes.INTEGER, allowNull: false },
    blobKey: { type: DataTypes.TEXT, allowNull: false },
    thumbKey: { type: DataTypes.TEXT, allowNull: false },
    contentType: { type: DataTypes.TEXT, allowNull: false },
    byteSize: { type: DataTypes.INTEGER, allowNull: false },
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.TEXT, allowNull: false },
    originalName: { type: DataTypes.TEXT, allowNull: true },
    caption: { type: DataTypes.TEXT, allowNull: true },
    removedAt: { type: DataTypes.DATE, allowNull: true },
    removedBy: { type: DataTypes.INTEGER, allowNull: true },
    createdAt: DataTypes.DATE,
  },
  { sequelize, tableName: 'record_photos', modelName: 'RecordPhoto', updatedAt: false },
);
