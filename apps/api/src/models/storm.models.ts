import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { StormChecklistItem, StormLocation } from '@app/shared';
import type { Boat } from './boat.model';
import type { User } from './user.model';

/** The club's watch on one forecast storm: forecast, harbours, checklist snapshot, and its closing lessons. */
export class StormWatch extends Model<
  InferAttributes<StormWatch>,
  InferCreationAttributes<StormWatch>
> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare sustainedKn: number;
  declare gustKn: number;
  declare surgeM: number;
  declare arrivesAt: Date;
  declare endsAt: Date;
  declare harborIds: number[];
  declare note: string;
  declare shareDetails: boolean;
  declare checklist: StormChecklistItem[];
  declare status: 'open' | 'closed';
  declare openedById: number | null;
  declare closedById: number | null;
  declare closedAt: Date | null;
  declare lessons: string | null;
  declare lessonsPostId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare openedBy?: NonAttribute<User | null>;
}

/** One boat's readiness for one watch. */
export class StormReadiness extends Model<
  InferAttributes<StormReadiness>,
  InferCreationAttributes<StormReadiness>
> {
  declare id: CreationOptional<number>;
  declare watchId: number;
  declare boatId: number;
  declare location: StormLocation | null;
  declare planId: number | null;
  declare depthM: number | null;
  declare ticked: string[];
  declare helpWanted: boolean;
  declare helpNote: string;
  declare buddyUserId: number | null;
  /** When the owner last saved it (null while only a buddy has been assigned). */
  declare filledAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare boat?: NonAttribute<Boat>;
  declare buddy?: NonAttribute<User | null>;
}

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (allowNull: boolean) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull });

export function initStormModels(sequelize: Sequelize) {
  StormWatch.init(
    {
      id,
      name: { type: DataTypes.STRING(80), allowNull: false },
      sustainedKn: { type: DataTypes.DOUBLE, allowNull: false },
      gustKn: { type: DataTypes.DOUBLE, allowNull: false },
      surgeM: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      arrivesAt: { type: DataTypes.DATE, allowNull: false },
      endsAt: { type: DataTypes.DATE, allowNull: false },
      harborIds: { type: DataTypes.JSON, allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false },
      shareDetails: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      checklist: { type: DataTypes.JSON, allowNull: false },
      status: { type: DataTypes.STRING(10), allowNull: false },
      openedById: ref(true),
      closedById: ref(true),
      closedAt: { type: DataTypes.DATE, allowNull: true },
      lessons: { type: DataTypes.TEXT, allowNull: true },
      lessonsPostId: ref(true),
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'storm_watches', underscored: true },
  );
  StormReadiness.init(
    {
      id,
      watchId: ref(false),
      boatId: ref(false),
      location: { type: DataTypes.STRING(20), allowNull: true },
      planId: ref(true),
      depthM: { type: DataTypes.DOUBLE, allowNull: true },
      ticked: { type: DataTypes.JSON, allowNull: false },
      helpWanted: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      helpNote: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
      buddyUserId: ref(true),
      filledAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'storm_readiness', underscored: true },
  );
}
