import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A subject of the trade that posts are filed under; admins edit the list. */
export class Topic extends Model<InferAttributes<Topic>, InferCreationAttributes<Topic>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare name: string;
  declare description: CreationOptional<string>;
  declare position: CreationOptional<number>;
  /** Set when an admin retires the topic: its posts keep it, new posts cannot choose it. */
  declare retiredAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initTopic(sequelize: Sequelize) {
  Topic.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
      name: { type: DataTypes.STRING(60), allowNull: false },
      description: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 100 },
      retiredAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'topics', underscored: true },
  );
}
