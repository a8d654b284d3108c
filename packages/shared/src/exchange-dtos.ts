import type { Currency, ListingCategory, ListingCondition, ListingStatus } from './exchange';
import type { SavedSearchCriteria } from './exchange-search';

export type FitStatus = 'fits' | 'marginal' | 'too-light' | 'not-rated';
export interface FitDto {
  status: FitStatus;
  /** One sentence: the rating compared with what the boat needs, and the basis. */
  reason: string;
}
export interface FitBasisDto {
  boatId: number;
  boatName: string;
  windKn: number;
  designLoadN: number;
  /** Rope must break at no less than designFactor × design load (wet). */
  designFactor: number;
  explanation: string;
  cautions: readonly string[];
}

export interface ListingPhotoDto {
  id: number;
  url: string;
  thumbUrl: string;
  width: number;
  height: number;
  position: number;
}
export interface SellerDto {
  id: number;
  displayName: string;
  memberSince: string;
  /** Whether the seller's dues are paid; left out for signed-out visitors. */
  paidUp?: boolean;
}
export interface ListingSummaryDto {
  id: number;
  category: ListingCategory;
  title: string;
  condition: ListingCondition;
  priceCents: number;
  currency: Currency;
  harborId: number;
  harborName: string;
  specs: Record<string, unknown>;
  /** Nominal size in mm used by the size filter (chain, rope, snubber, shackle), or null. */
  sizeMm: number | null;
  thumbUrl: string | null;
  sellerName: string;
  publishedAt: string | null;
  fit?: FitDto;
}
export interface ListingDto extends Omit<ListingSummaryDto, 'sellerName'> {
  description: string;
  status: ListingStatus;
  hidden: boolean;
  expiresAt: string | null;
  soldAt: string | null;
  photos: ListingPhotoDto[];
  seller: SellerDto;
  isMine: boolean;
  /** Who a sold listing went to, when the seller chose a member: shown to that seller and that buyer only. */
  soldTo?: { displayName: string; isMe: boolean };
  createdAt: string;
  updatedAt: string;
}
export interface ListingSearchResultDto {
  data: ListingSummaryDto[];
  meta: { page: number; pageSize: number; total: number; tookMs: number; fitBasis?: FitBasisDto };
}

export interface ThreadSummaryDto {
  id: number;
  listingId: number;
  listingTitle: string;
  listingStatus: ListingStatus;
  otherParty: { id: number; displayName: string };
  role: 'buyer' | 'seller';
  lastMessage: string;
  lastMessageAt: string;
  unread: number;
  soldToThisThread: boolean;
}
export interface MessageDto {
  id: number;
  senderId: number;
  mine: boolean;
  body: string;
  createdAt: string;
}
export interface ThreadDto extends ThreadSummaryDto {
  messages: MessageDto[];
}
export interface SavedSearchDto {
  id: number;
  name: string;
  criteria: SavedSearchCriteria;
  createdAt: string;
}
export interface ListingReportDto {
  id: number;
  listingId: number;
  listingTitle: string;
  reporterName: string;
  reason: string;
  status: 'open' | 'resolved';
  createdAt: string;
}
