import type { CommentStatus, PostKind, PostSetup, PostStatus, PostVisibility } from './knowledge';

export interface TopicDto {
  id: number;
  slug: string;
  name: string;
  description: string;
  position: number;
  /** Retired topics keep their posts but are not offered for new ones. */
  retired: boolean;
  postCount: number;
}

export interface PostAuthorDto {
  id: number;
  displayName: string;
}

export interface PostSummaryDto {
  id: number;
  kind: PostKind;
  title: string;
  excerpt: string;
  status: PostStatus;
  visibility: PostVisibility;
  topic: {
    id: number;
    slug: string;
    name: string; /** In the moderation queue: this entry is an edit of a published post (readers still see the published one). */
    editOfPublished?: boolean;
  } | null;
  author: PostAuthorDto;
  hasSetup: boolean;
  helpfulCount: number;
  commentCount: number;
  answered: boolean;
  pinned: boolean;
  locked: boolean;
  publishedAt: string | null;
  updatedAt: string;
}

/** The figures computed for a post's setup by @app/calc. */
export interface SetupCardDto {
  setup: PostSetup;
  loadN: number;
  heightM: number;
  rodeLengthM: number;
  scopeRatio: number | null;
  scopeLabel: string | null;
  weakest: { label: string; marginOnWll: number; breakFactor: number } | null;
  withinWll: boolean | null;
  catenary: {
    suspendedM: number;
    onBottomM: number;
    bowAngleDeg: number;
    anchorAngleDeg: number;
    liftsAtAnchor: boolean;
  } | null;
  /** The setup's anchor against the holding model at the design wind (null without an anchor). */
  anchor: {
    massKg: number;
    neededKg: number | null;
    meetsMinimum: boolean;
    meetsSuggested: boolean;
  } | null;
  /** What Rodewise recommends for the same boat and wind, the same function as the boat page. */
  recommendation: {
    anchorType: string;
    anchorKg: number | null;
    chain: string | null;
    nylon: string | null;
    snubber: string;
  } | null;
  warnings: string[];
  cautions: string[];
  basis: string;
}

export interface CommentDto {
  id: number;
  postId: number;
  parentId: number | null;
  author: PostAuthorDto;
  body: string;
  status: CommentStatus;
  accepted: boolean;
  createdAt: string;
  replies: CommentDto[];
}

/** Where an edit of a published post stands: waiting, sent back with a note, or turned down. */
export type RevisionStatus = 'pending' | 'changes-requested' | 'rejected';

/** An edit of a published post that waits for a moderator (shown to its author and moderators only). */
export interface PostRevisionDto {
  status: RevisionStatus;
  kind: PostKind;
  title: string;
  topicId: number | null;
  boatId: number | null;
  visibility: PostVisibility;
  body: unknown;
  bodyHtml: string;
  setup: PostSetup | null;
}

export interface PostDetailDto extends PostSummaryDto {
  body: unknown;
  bodyHtml: string;
  /** The author's edit waiting for a moderator; the fields above stay what readers see until it is approved. */
  revision: PostRevisionDto | null;
  moderationNote: string | null;
  boat: { id: number; name: string; hull: string; loaM: number } | null;
  setupCard: SetupCardDto | null;
  acceptedCommentId: number | null;
  comments: CommentDto[];
  viewer: {
    canEdit: boolean;
    canModerate: boolean;
    canAccept: boolean;
    hasVoted: boolean;
    canComment: boolean;
  };
}

/** One piece of highlighted text: `match` pieces are the words that matched the search. */
export interface HighlightPiece {
  text: string;
  match: boolean;
}
export interface SearchHitDto {
  post: PostSummaryDto;
  score: number;
  title: HighlightPiece[];
  snippet: HighlightPiece[];
  terms: string[];
}

export interface NotificationDto {
  id: number;
  kind: string;
  message: string;
  link: string | null;
  readAt: string | null;
  createdAt: string;
}
