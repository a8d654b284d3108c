import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One row a decision changed: which columns, and their values before and after (JSON-safe, dates tagged). */
export interface RowChange {
  kind: 'post' | 'comment' | 'report' | 'listing' | 'listing-report';
  id: number;
  before: Record<string, unknown>;
  after: Record<string, unknown>;
}

/** What a decision told people: in-app notices and outbox e-mails (ids), and to whom. */
export interface DecisionNotices {
  notifications: number[];
  emails: number[];
  /** Who each e-mail went to, so a correction can follow one that was already sent. */
  emailTo: Array<{ emailId: number; userId: number }>;
  /** Where a correction links to (inside the app). */
  path?: string | null;
}

/** A moderator's decision, kept so it can be undone within `UNDO_WINDOW_MS`. */
export class ModerationDecision extends Model<
  InferAttributes<ModerationDecision>,
  InferCreationAttributes<ModerationDecision>
> {
  declare id: CreationOptional<number>;
  declare actorId: number;
  declare area: string;
  declare action: string;
  declare subjectType: string;
  declare subjectId: number;
  declare title: string;
  declare changes: RowChange[];
  declare notices: DecisionNotices;
  declare undoneAt: Date | null;
  declare undoneById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initModerationDecision(sequelize: Sequelize) {
  ModerationDecision.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      area: { type: DataTypes.STRING(20), allowNull: false },
      action: { type: DataTypes.STRING(60), allowNull: false },
      subjectType: { type: DataTypes.STRING(20), allowNull: false },
      subjectId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
      changes: { type: DataTypes.JSON, allowNull: false },
      notices: { type: DataTypes.JSON, allowNull: false },
      undoneAt: { type: DataTypes.DATE, allowNull: true },
      undoneById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, tableName: 'moderation_decisions', underscored: true },
  );
}
