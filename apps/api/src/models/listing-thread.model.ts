import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Listing } from './listing.model';
import type { User } from './user.model';

/** A buyer–seller conversation about one listing; one per buyer and listing. */
export class ListingThread extends Model<
  InferAttributes<ListingThread>,
  InferCreationAttributes<ListingThread>
> {
  declare id: CreationOptional<number>;
  declare listingId: number;
  declare buyerId: number;
  declare sellerId: number;
  declare lastMessageAt: Date;
  declare buyerReadAt: Date | null;
  declare sellerReadAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare listing?: NonAttribute<Listing>;
  declare buyer?: NonAttribute<User>;
  declare seller?: NonAttribute<User>;
}

/** Registers the model on `sequelize`. */
export function initListingThread(sequelize: Sequelize) {
  ListingThread.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      listingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      buyerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      sellerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      lastMessageAt: { type: DataTypes.DATE(3), allowNull: false },
      buyerReadAt: { type: DataTypes.DATE(3), allowNull: true },
      sellerReadAt: { type: DataTypes.DATE(3), allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'listing_threads', underscored: true },
  );
}
