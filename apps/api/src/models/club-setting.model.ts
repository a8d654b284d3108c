import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** Key → JSON value; read through the club-settings service, which knows each key's schema and default. */
export class ClubSetting extends Model<
  InferAttributes<ClubSetting>,
  InferCreationAttributes<ClubSetting>
> {
  declare key: string;
  declare value: unknown;
  declare updatedAt: CreationOptional<Date>;
}

export function initClubSetting(sequelize: Sequelize) {
  ClubSetting.init(
    {
      key: { type: DataTypes.STRING(64), primaryKey: true },
      value: { type: DataTypes.JSON, allowNull: false },
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'club_settings', underscored: true, createdAt: false },
  );
}
