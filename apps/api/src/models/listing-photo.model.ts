import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One re-encoded photo of a listing (storage keys, never the client's file name). */
export class ListingPhoto extends Model<
  InferAttributes<ListingPhoto>,
  InferCreationAttributes<ListingPhoto>
> {
  declare id: CreationOptional<number>;
  declare listingId: number;
  declare storageKey: string;
  declare thumbKey: string;
  declare width: number;
  declare height: number;
  declare position: number;
  /** Bytes stored for the photo and its thumbnail (counts against the seller's image quota; 0 before it was kept). */
  declare bytes: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** Registers the model on `sequelize`. */
export function initListingPhoto(sequelize: Sequelize) {
  ListingPhoto.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      listingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      storageKey: { type: DataTypes.STRING(200), allowNull: false },
      thumbKey: { type: DataTypes.STRING(200), allowNull: false },
      width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      position: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'listing_photos', underscored: true },
  );
}
