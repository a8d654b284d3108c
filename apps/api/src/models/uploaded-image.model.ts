import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * One image a member uploaded for a post (the file and its thumbnail in storage). `claimedAt` is set while a
 * saved post or pending revision shows it; an image left unclaimed past the grace period is removed by the sweep.
 */
export class UploadedImage extends Model<
  InferAttributes<UploadedImage>,
  InferCreationAttributes<UploadedImage>
> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare storageKey: string;
  declare thumbKey: string;
  declare bytes: number;
  declare claimedAt: Date | null;
  declare releasedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** Registers the model on `sequelize`. */
export function initUploadedImage(sequelize: Sequelize) {
  UploadedImage.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      storageKey: { type: DataTypes.STRING(200), allowNull: false, unique: true },
      thumbKey: { type: DataTypes.STRING(200), allowNull: false },
      bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      claimedAt: { type: DataTypes.DATE, allowNull: true },
      releasedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'uploaded_images', underscored: true },
  );
}
