import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { CommentStatus } from '@app/shared';
import type { Post } from './post.model';
import type { User } from './user.model';

/** An answer or remark on a post; replies sit one level under a top-level comment. */
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<number>;
  declare postId: number;
  declare authorId: number;
  declare parentId: number | null;
  declare body: string;
  declare status: CommentStatus;
  declare moderationNote: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare author?: NonAttribute<User>;
  declare post?: NonAttribute<Post>;
}

export function initComment(sequelize: Sequelize) {
  Comment.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      postId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      parentId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      body: { type: DataTypes.TEXT, allowNull: false },
      status: { type: DataTypes.STRING(12), allowNull: false },
      moderationNote: { type: DataTypes.STRING(1000), allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'comments', underscored: true },
  );
}
