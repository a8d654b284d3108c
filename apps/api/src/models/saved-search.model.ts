import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { SavedSearchCriteria } from '@app/shared';
import type { User } from './user.model';

/** A member's saved exchange search; new matching listings are e-mailed once each. */
export class SavedSearch extends Model<
  InferAttributes<SavedSearch>,
  InferCreationAttributes<SavedSearch>
> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare name: string;
  declare criteria: SavedSearchCriteria;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare user?: NonAttribute<User>;
}

/** A listing already announced to a saved search (unique pair: each match is e-mailed once). */
export class SavedSearchHit extends Model<
  InferAttributes<SavedSearchHit>,
  InferCreationAttributes<SavedSearchHit>
> {
  declare id: CreationOptional<number>;
  declare savedSearchId: number;
  declare listingId: number;
  declare createdAt: CreationOptional<Date>;
}

/** Registers both models on `sequelize`. */
export function initSavedSearch(sequelize: Sequelize) {
  SavedSearch.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      criteria: { type: DataTypes.JSON, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'saved_searches', underscored: true },
  );
  SavedSearchHit.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      savedSearchId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      listingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'saved_search_hits', underscored: true, updatedAt: false },
  );
}
