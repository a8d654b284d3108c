import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { BoatDto, Hull } from '@app/shared';

/** A member's boat profile, all quantities in SI. */
export class Boat extends Model<InferAttributes<Boat>, InferCreationAttributes<Boat>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare name: string;
  declare hull: Hull;
  declare loaM: number;
  declare beamM: number | null;
  declare displacementKg: number | null;
  declare draftM: number | null;
  declare bowHeightM: number;
  declare gypsy: BoatDto['gypsy'];
  declare homeHarborId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initBoat(sequelize: Sequelize) {
  Boat.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      name: { type: DataTypes.STRING(80), allowNull: false },
      hull: { type: DataTypes.STRING(12), allowNull: false },
      loaM: { type: DataTypes.DOUBLE, allowNull: false },
      beamM: { type: DataTypes.DOUBLE, allowNull: true },
      displacementKg: { type: DataTypes.DOUBLE, allowNull: true },
      draftM: { type: DataTypes.DOUBLE, allowNull: true },
      bowHeightM: { type: DataTypes.DOUBLE, allowNull: false },
      gypsy: { type: DataTypes.JSON, allowNull: true },
      homeHarborId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'boats', underscored: true },
  );
}
