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

/** A member's report on a listing, open until a moderator resolves it. One per member and listing. */
export class ListingReport extends Model<
  InferAttributes<ListingReport>,
  InferCreationAttributes<ListingReport>
> {
  declare id: CreationOptional<number>;
  declare listingId: number;
  declare reporterId: number;
  declare reason: string;
  declare status: 'open' | 'resolved';
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare listing?: NonAttribute<Listing>;
  declare reporter?: NonAttribute<User>;
}

/** Registers the model on `sequelize`. */
export function initListingReport(sequelize: Sequelize) {
  ListingReport.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      listingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      reporterId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      reason: { type: DataTypes.STRING(1000), allowNull: false },
      status: { type: DataTypes.STRING(10), allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'listing_reports', underscored: true },
  );
}
