import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** An in-app notice for one member (reply, accepted answer, moderation outcome). */
export class Notification extends Model<
  InferAttributes<Notification>,
  InferCreationAttributes<Notification>
> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare kind: string;
  declare message: string;
  declare link: string | null;
  declare readAt: Date | null;
  declare createdAt: CreationOptional<Date>;
}

export function initNotification(sequelize: Sequelize) {
  Notification.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      kind: { type: DataTypes.STRING(30), allowNull: false },
      message: { type: DataTypes.STRING(300), allowNull: false },
      link: { type: DataTypes.STRING(300), allowNull: true },
      readAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'notifications', underscored: true, updatedAt: false },
  );
}
