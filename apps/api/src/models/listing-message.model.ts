import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One message in a listing thread. */
export class ListingMessage extends Model<
  InferAttributes<ListingMessage>,
  InferCreationAttributes<ListingMessage>
> {
  declare id: CreationOptional<number>;
  declare threadId: number;
  declare senderId: number;
  declare body: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** Registers the model on `sequelize`. */
export function initListingMessage(sequelize: Sequelize) {
  ListingMessage.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      threadId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      senderId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      body: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'listing_messages', underscored: true },
  );
}
