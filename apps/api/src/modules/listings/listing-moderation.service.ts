import { UniqueConstraintError } from 'sequelize';
import { AppError, notFound } from '../../errors/app-error';
import { Listing, ListingReport, User } from '../../models';
import { recordAudit } from '../audit/audit.service';
import { enqueueEmail } from '../mail/outbox.service';
import { actionEmail } from '../mail/templates';
import { DecisionRecord } from '../audit/decision-record';
import { refreshListing } from './listing-index';
import { getVisibleListing, listingUrl, type ExchangeContext } from './listing-reads.service';
import { canReportListing } from '../../policies/listings';

/** A member reports a listing they can see (not their own); once per member and listing. */
export async function reportListing(actor: User, id: number, reason: string) {
  const listing = await getVisibleListing(actor, id);
  if (!canReportListing(actor, listing))
    throw new AppError('CONFLICT', 'You cannot report your own listing');
  try {
    return await ListingReport.create({
      listingId: id,
      reporterId: actor.id,
      reason,
      status: 'open',
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError)
      throw new AppError('CONFLICT', 'You have already reported this listing');
    throw err;
  }
}

/** Open reports, oldest first, for the moderators' queue. */
export const openReports = () =>
  ListingReport.findAll({
    where: { status: 'open' },
    include: [
      { model: Listing, as: 'listing' },
      { model: User, as: 'reporter' },
    ],
    order: [['createdAt', 'ASC']],
    limit: 200,
  });

/**
 * A moderator hides a listing: it leaves search, its open reports are resolved, the seller is told, the audit
 * log records why. Kept as a decision that can be undone for a while (`undoDecision`).
 */
export async function hideListing(ctx: ExchangeContext, mod: User, id: number, reason: string) {
  const listing = await Listing.findByPk(id);
  if (!listing) throw notFound('Listing');
  const sequelize = Listing.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  const seller = await User.findByPk(listing.sellerId);
  const decision = await sequelize.transaction(async (transaction) => {
    const rec = new DecisionRecord(transaction);
    await rec.update('listing', listing, { hiddenAt: new Date(), hiddenReason: reason });
    const open = await ListingReport.findAll({
      where: { listingId: id, status: 'open' },
      transaction,
    });
    for (const r of open) await rec.update('listing-report', r, { status: 'resolved' });
    await recordAudit(
      {
        actorId: mod.id,
        area: 'exchange',
        action: 'listing.hide',
        subjectType: 'listing',
        subjectId: String(id),
        reason,
        details: { title: listing.title },
      },
      transaction,
    );
    if (seller) {
      const email = await enqueueEmail(
        actionEmail({
          to: seller.email,
          kind: 'listing-hidden',
          subject: `Your listing was hidden: ${listing.title}`,
          greeting: `Hello ${seller.displayName},`,
          lines: [`A moderator hid “${listing.title}” from the exchange.`, `Reason: ${reason}`],
          actionLabel: 'See the listing',
          actionUrl: listingUrl(ctx, id),
          footer: 'Reply to the club moderators if you think this was a mistake.',
        }),
        transaction,
      );
      rec.told({ userId: seller.id, emailId: email.id });
    }
    return rec.save(mod, {
      area: 'exchange',
      action: 'listing.hide',
      subjectType: 'listing',
      subjectId: id,
      title: listing.title,
      path: `/exchange/listings/${id}`,
    });
  });
  await refreshListing(id);
  return { row: listing, decision };
}

/** A moderator shows a hidden listing again (audited). */
export async function unhideListing(mod: User, id: number) {
  const listing = await Listing.findByPk(id);
  if (!listing) throw notFound('Listing');
  await listing.update({ hiddenAt: null, hiddenReason: null });
  await recordAudit({
    actorId: mod.id,
    area: 'exchange',
    action: 'listing.unhide',
    subjectType: 'listing',
    subjectId: String(id),
    details: { title: listing.title },
  });
  await refreshListing(id);
  return listing;
}

/**
 * A moderator dismisses one open report without hiding the listing; `note` (may be empty) is the audit
 * row's reason. NOT_FOUND for an unknown report, CONFLICT for one already resolved. Can be undone for a while.
 */
export async function dismissReport(mod: User, reportId: number, note = '') {
  const report = await ListingReport.findByPk(reportId, {
    include: [{ model: Listing, as: 'listing' }],
  });
  if (!report) throw notFound('Report');
  if (report.status !== 'open') throw new AppError('CONFLICT', 'This report is already resolved');
  const sequelize = ListingReport.sequelize;
  if (!sequelize) throw new Error('Models are not initialised');
  return sequelize.transaction(async (transaction) => {
    const rec = new DecisionRecord(transaction);
    await rec.update('listing-report', report, { status: 'resolved' });
    await recordAudit(
      {
        actorId: mod.id,
        area: 'exchange',
        action: 'listing-report.dismiss',
        subjectType: 'listing-report',
        subjectId: String(reportId),
        reason: note || null,
        details: { listingId: report.listingId, title: report.listing?.title ?? '' },
      },
      transaction,
    );
    return rec.save(mod, {
      area: 'exchange',
      action: 'listing-report.dismiss',
      subjectType: 'listing-report',
      subjectId: reportId,
      title: report.listing?.title ?? '',
      path: null,
    });
  });
}
