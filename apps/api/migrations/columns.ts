import { DataTypes } from 'sequelize';

// The column shapes the migrations share. A shipped migration's schema must never change, so these stay as they
// are: a new shape gets a new name here, and an existing one is never edited.

/** Unsigned auto-increment primary key. */
export const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };

/** A required timestamp (created_at, updated_at and other instants that must be set). */
export const ts = { type: DataTypes.DATE, allowNull: false };

/** An unsigned integer foreign key to `table.id`. */
export const fk = (
  table: string,
  onDelete: 'CASCADE' | 'SET NULL' | 'RESTRICT',
  allowNull: boolean,
) => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});
