import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { PostKind, PostSetup, PostStatus, PostVisibility, RevisionStatus } from '@app/shared';

/** What readers would see once a revision is approved. */
export interface PostRevision {
  kind: PostKind;
  title: string;
  topicId: number | null;
  boatId: number | null;
  visibility: PostVisibility;
  setup: PostSetup | null;
  bodyJson: unknown;
  bodyHtml: string;
  bodyText: string;
}
import type { Topic } from './topic.model';
import type { User } from './user.model';

/** A knowledge post: an article or a question, its body as Tiptap JSON plus sanitized HTML and plain text. */
export class Post extends Model<InferAttributes<Post>, InferCreationAttributes<Post>> {
  declare id: CreationOptional<number>;
  declare authorId: number;
  declare topicId: number | null;
  declare boatId: number | null;
  declare kind: PostKind;
  declare title: string;
  declare bodyJson: unknown;
  declare bodyHtml: string;
  declare bodyText: string;
  /** The plain text as last approved, to measure how much an edit changes. */
  declare approvedText: string | null;
  /** The title as last approved. */
  declare approvedTitle: CreationOptional<string | null>;
  /** An edit of a published post waiting for a moderator; readers see the published columns meanwhile. */
  declare revision: CreationOptional<PostRevision | null>;
  declare revisionStatus: CreationOptional<RevisionStatus | null>;
  declare status: PostStatus;
  declare visibility: PostVisibility;
  declare setup: PostSetup | null;
  declare moderationNote: string | null;
  declare acceptedCommentId: number | null;
  declare helpfulCount: CreationOptional<number>;
  declare pinnedAt: Date | null;
  declare lockedAt: Date | null;
  declare publishedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare author?: NonAttribute<User>;
  declare topic?: NonAttribute<Topic | null>;
}

export function initPost(sequelize: Sequelize) {
  Post.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      topicId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      boatId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      kind: { type: DataTypes.STRING(12), allowNull: false },
      title: { type: DataTypes.STRING(160), allowNull: false },
      bodyJson: { type: DataTypes.JSON, allowNull: false },
      bodyHtml: { type: DataTypes.TEXT('medium'), allowNull: false },
      bodyText: { type: DataTypes.TEXT('medium'), allowNull: false },
      approvedText: { type: DataTypes.TEXT('medium'), allowNull: true },
      approvedTitle: { type: DataTypes.STRING(160), allowNull: true },
      revision: { type: DataTypes.JSON, allowNull: true },
      revisionStatus: { type: DataTypes.STRING(20), allowNull: true },
      status: { type: DataTypes.STRING(20), allowNull: false },
      visibility: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'public' },
      setup: { type: DataTypes.JSON, allowNull: true },
      moderationNote: { type: DataTypes.STRING(1000), allowNull: true },
      acceptedCommentId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      helpfulCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      pinnedAt: { type: DataTypes.DATE, allowNull: true },
      lockedAt: { type: DataTypes.DATE, allowNull: true },
      publishedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'posts', underscored: true },
  );
}
