import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type EmailTokenKind = 'verify' | 'reset';

/** A single-use e-mailed token; only its SHA-256 hash is stored. */
export class EmailToken extends Model<
  InferAttributes<EmailToken>,
  InferCreationAttributes<EmailToken>
> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare kind: EmailTokenKind;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
}

export function initEmailToken(sequelize: Sequelize) {
  EmailToken.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      kind: { type: DataTypes.STRING(10), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'email_tokens', underscored: true, updatedAt: false },
  );
}
