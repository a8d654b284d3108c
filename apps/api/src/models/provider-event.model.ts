import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One processed webhook event; the unique event id makes redelivery a no-op. */
export class ProviderEvent extends Model<
  InferAttributes<ProviderEvent>,
  InferCreationAttributes<ProviderEvent>
> {
  declare id: CreationOptional<number>;
  declare eventId: string;
  declare type: string;
  declare outcome: string;
  declare createdAt: CreationOptional<Date>;
}

/** Registers the model on `sequelize`. */
export function initProviderEvent(sequelize: Sequelize) {
  ProviderEvent.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      eventId: { type: DataTypes.STRING(255), allowNull: false, unique: true },
      type: { type: DataTypes.STRING(80), allowNull: false },
      outcome: { type: DataTypes.STRING(40), allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'provider_events', underscored: true, updatedAt: false },
  );
}
