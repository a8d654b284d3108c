import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One member's "helpful" vote on a post (unique per member and post). */
export class Vote extends Model<InferAttributes<Vote>, InferCreationAttributes<Vote>> {
  declare id: CreationOptional<number>;
  declare postId: number;
  declare userId: number;
  declare createdAt: CreationOptional<Date>;
}

export function initVote(sequelize: Sequelize) {
  Vote.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      postId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'votes', underscored: true, updatedAt: false },
  );
}
