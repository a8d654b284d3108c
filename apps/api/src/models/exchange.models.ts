import type { Sequelize } from 'sequelize';
import { Harbor } from './harbor.model';
import { Listing, initListing } from './listing.model';
import { ListingMessage, initListingMessage } from './listing-message.model';
import { ListingPhoto, initListingPhoto } from './listing-photo.model';
import { ListingReport, initListingReport } from './listing-report.model';
import { ListingThread, initListingThread } from './listing-thread.model';
import { SavedSearch, initSavedSearch } from './saved-search.model';
import { User } from './user.model';

/** Registers the exchange models and their associations (called from initModels). */
export function initExchangeModels(sequelize: Sequelize) {
  initListing(sequelize);
  initListingPhoto(sequelize);
  initListingThread(sequelize);
  initListingMessage(sequelize);
  initSavedSearch(sequelize);
  initListingReport(sequelize);

  Listing.belongsTo(User, { as: 'seller', foreignKey: 'sellerId' });
  Listing.belongsTo(Harbor, { as: 'harbor', foreignKey: 'harborId' });
  Listing.hasMany(ListingPhoto, { as: 'photos', foreignKey: 'listingId' });
  ListingThread.belongsTo(Listing, { as: 'listing', foreignKey: 'listingId' });
  ListingThread.belongsTo(User, { as: 'buyer', foreignKey: 'buyerId' });
  ListingThread.belongsTo(User, { as: 'seller', foreignKey: 'sellerId' });
  ListingThread.hasMany(ListingMessage, { as: 'messages', foreignKey: 'threadId' });
  SavedSearch.belongsTo(User, { as: 'user', foreignKey: 'userId' });
  ListingReport.belongsTo(Listing, { as: 'listing', foreignKey: 'listingId' });
  ListingReport.belongsTo(User, { as: 'reporter', foreignKey: 'reporterId' });
}
