/** What the listing editor shows after the new-listing form sent the seller there (router state). */
export interface ListingEditorNotice {
  notice?: string;
  /** A step after saving the draft that did not work (photos, publishing). */
  problem?: string;
}
