import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Currency, ListingCategory, ListingCondition, ListingStatus } from '@app/shared';
import type { Harbor } from './harbor.model';
import type { ListingPhoto } from './listing-photo.model';
import type { User } from './user.model';

/** A piece of gear offered on the exchange. Specs are typed per category (validated by the shared schema), in SI. */
export class Listing extends Model<InferAttributes<Listing>, InferCreationAttributes<Listing>> {
  declare id: CreationOptional<number>;
  declare sellerId: number;
  declare category: ListingCategory;
  declare title: string;
  declare description: string;
  declare specs: Record<string, unknown>;
  declare condition: ListingCondition;
  declare priceCents: number;
  declare currency: Currency;
  declare harborId: number;
  declare status: ListingStatus;
  /** Nominal size in mm (chain, rope, snubber, shackle) for the size filter; null for the rest. */
  declare sizeMm: number | null;
  declare publishedAt: Date | null;
  declare expiresAt: Date | null;
  declare soldAt: Date | null;
  declare soldThreadId: number | null;
  declare hiddenAt: Date | null;
  declare hiddenReason: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare seller?: NonAttribute<User>;
  declare harbor?: NonAttribute<Harbor>;
  declare photos?: NonAttribute<ListingPhoto[]>;
}

/** Registers the model on `sequelize`. */
export function initListing(sequelize: Sequelize) {
  Listing.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      sellerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      category: { type: DataTypes.STRING(12), allowNull: false },
      title: { type: DataTypes.STRING(100), allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: false },
      specs: { type: DataTypes.JSON, allowNull: false },
      condition: { type: DataTypes.STRING(12), allowNull: false },
      priceCents: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false },
      harborId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      status: { type: DataTypes.STRING(10), allowNull: false },
      sizeMm: { type: DataTypes.DOUBLE, allowNull: true },
      publishedAt: { type: DataTypes.DATE, allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      soldAt: { type: DataTypes.DATE, allowNull: true },
      soldThreadId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      hiddenAt: { type: DataTypes.DATE, allowNull: true },
      hiddenReason: { type: DataTypes.STRING(1000), allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: 'listings', underscored: true },
  );
}
