import { Router, type Request } from 'express';
import { z } from 'zod';
import {
  MAX_LISTING_PHOTOS,
  dismissListingReportSchema,
  hideListingSchema,
  idParam,
  listingInputSchema,
  listingSearchSchema,
  markSoldSchema,
  photoOrderSchema,
  reportListingSchema,
  type ListingReportDto,
} from '@app/shared';
import { currentUser, requireAuth, requireRole } from '../../middleware/require-auth';
import type { User } from '../../models';
import { getOwnBoat } from '../boats/boats.service';
import { imageUpload } from '../uploads/uploads.router';
import { DEFAULT_FIT_WIND_KN, boatNeeds, fitOf } from './fit';
import { ensureListingIndex } from './listing-index';
import { anonymousListingDetail } from './listing-read-cache';
import * as moderation from './listing-moderation.service';
import * as photos from './listing-photos.service';
import { ratingOf } from './listing-specs';
import { toListingDto, toListingPhotoDto } from './listings.presenter';
import { searchResponse } from './search-response';
import * as reads from './listing-reads.service';
import { markSold } from './listing-sale.service';
import * as listings from './listings.service';
import { threadsOfListing } from '../threads/threads.service';
import { ROLES_MODERATOR } from '../../policies/roles';

const listingParams = idParam('listingId');
const photoParams = z.object({
  listingId: z.coerce.number().int().positive('Unknown listingId'),
  photoId: z.coerce.number().int().positive('Unknown photoId'),
});
const reportParams = idParam('reportId');
const publishFlag = z.object({ publish: z.boolean().default(false) });
const fitQuery = z.object({
  fitsBoat: z.coerce.number().int().positive().optional(),
  windKn: z.coerce.number().min(10).max(70).optional(),
});

const viewerOf = (req: Request): User | null => req.user ?? null;
const idOf = (req: Request) => Number(listingParams.parse(req.params).listingId);

/** `/api/listings`: the gear exchange (search, listing life-cycle, photos, reports, moderation). */
export function listingsRouter(ctx: reads.ExchangeContext) {
  const r = Router();
  const show = async (req: Request, id: number) => {
    const viewer = viewerOf(req);
    const { listing, seller } = await reads.getVisibleListingPage(viewer, id);
    const { fitsBoat, windKn } = fitQuery.parse(req.query);
    const fit =
      fitsBoat && viewer
        ? fitOf(
            ratingOf(listing.category, listing.specs, listing.condition),
            boatNeeds(await getOwnBoat(viewer, fitsBoat), windKn ?? DEFAULT_FIT_WIND_KN),
          )
        : undefined;
    const soldTo = await reads.soldToFor(viewer, listing);
    return toListingDto(listing, seller, {
      isMine: viewer?.id === listing.sellerId,
      fit,
      ...(soldTo ? { soldTo } : {}),
    });
  };

  r.get('/', async (req, res) => {
    const query = listingSearchSchema.parse(req.query);
    const viewer = viewerOf(req);
    const needs =
      query.fitsBoat && viewer
        ? boatNeeds(await getOwnBoat(viewer, query.fitsBoat), query.windKn ?? DEFAULT_FIT_WIND_KN)
        : undefined;
    if (query.fitsBoat && !viewer) currentUser(req);
    await ensureListingIndex();
    const { body, etag } = searchResponse(query, needs);
    // Express answers 304 itself when If-None-Match carries this ETag.
    res.set('ETag', etag).type('json').send(body);
  });
  r.get('/mine', requireAuth(), async (req, res) => {
    const actor = currentUser(req);
    const seller = await reads.sellerOf(actor.id);
    const mine = await reads.listMine(actor);
    res.json({ data: mine.map((l) => toListingDto(l, seller, { isMine: true })) });
  });
  r.get('/reports', requireRole(...ROLES_MODERATOR), async (_req, res) => {
    const reports = await moderation.openReports();
    res.json({
      data: reports.map((x): ListingReportDto => ({
        id: x.id,
        listingId: x.listingId,
        listingTitle: x.listing?.title ?? '',
        reporterName: x.reporter?.displayName ?? '',
        reason: x.reason,
        status: x.status,
        createdAt: x.createdAt.toISOString(),
      })),
    });
  });
  r.post('/reports/:reportId/dismiss', requireRole(...ROLES_MODERATOR), async (req, res) => {
    const { reportId } = reportParams.parse(req.params);
    const { note } = dismissListingReportSchema.parse(req.body ?? {});
    const decision = await moderation.dismissReport(currentUser(req), Number(reportId), note);
    res.json({ data: { id: Number(reportId), status: 'resolved', decisionId: decision.id } });
  });
  r.post('/', requireAuth(), async (req, res) => {
    const input = listingInputSchema.parse(req.body);
    const { publish } = publishFlag.parse(req.body);
    const listing = await listings.createListing(ctx, currentUser(req), input, { publish });
    res.status(201).json({ data: await show(req, listing.id) });
  });
  r.get('/:listingId', async (req, res) => {
    const id = idOf(req);
    if (req.user) {
      res.json({ data: await show(req, id) });
      return;
    }
    // Visitors share one copy per listing. fitsBoat needs a signed-in owner, so it never applies to them, but the
    // query is still checked (400 for a bad windKn) as for everyone else.
    const data = await anonymousListingDetail(id);
    fitQuery.parse(req.query);
    res.json({ data });
  });
  r.put('/:listingId', requireAuth(), async (req, res) => {
    const id = idOf(req);
    await listings.updateListing(currentUser(req), id, listingInputSchema.parse(req.body));
    res.json({ data: await show(req, id) });
  });
  r.post('/:listingId/publish', requireAuth(), async (req, res) => {
    const id = idOf(req);
    await listings.publishListing(ctx, currentUser(req), id);
    res.json({ data: await show(req, id) });
  });
  r.post('/:listingId/relist', requireAuth(), async (req, res) => {
    const id = idOf(req);
    await listings.relistListing(ctx, currentUser(req), id);
    res.json({ data: await show(req, id) });
  });
  r.post('/:listingId/withdraw', requireAuth(), async (req, res) => {
    const id = idOf(req);
    await listings.withdrawListing(currentUser(req), id);
    res.json({ data: await show(req, id) });
  });
  r.post('/:listingId/sold', requireAuth(), async (req, res) => {
    const id = idOf(req);
    const { threadId } = markSoldSchema.parse(req.body ?? {});
    await markSold(ctx, currentUser(req), id, threadId);
    res.json({ data: await show(req, id) });
  });
  r.get('/:listingId/threads', requireAuth(), async (req, res) => {
    const id = idOf(req);
    await reads.getOwnListing(currentUser(req), id);
    res.json({ data: await threadsOfListing(currentUser(req), id) });
  });
  r.post(
    '/:listingId/photos',
    requireAuth(),
    imageUpload(MAX_LISTING_PHOTOS).array('photos', MAX_LISTING_PHOTOS),
    async (req, res) => {
      const id = idOf(req);
      const files = Array.isArray(req.files) ? req.files : [];
      const added = await photos.addPhotos(
        currentUser(req),
        id,
        files.map((f) => f.buffer),
      );
      res.status(201).json({ data: added.map(toListingPhotoDto) });
    },
  );
  r.put('/:listingId/photos/order', requireAuth(), async (req, res) => {
    const id = idOf(req);
    await photos.reorderPhotos(currentUser(req), id, photoOrderSchema.parse(req.body).photoIds);
    res.json({ data: await show(req, id) });
  });
  r.delete('/:listingId/photos/:photoId', requireAuth(), async (req, res) => {
    const { listingId, photoId } = photoParams.parse(req.params);
    await photos.deletePhoto(currentUser(req), listingId, photoId);
    res.status(204).end();
  });
  r.post('/:listingId/reports', requireAuth(), async (req, res) => {
    const { reason } = reportListingSchema.parse(req.body);
    await moderation.reportListing(currentUser(req), idOf(req), reason);
    res.status(201).json({ data: { reported: true } });
  });
  r.post('/:listingId/hide', requireRole(...ROLES_MODERATOR), async (req, res) => {
    const id = idOf(req);
    const { decision } = await moderation.hideListing(
      ctx,
      currentUser(req),
      id,
      hideListingSchema.parse(req.body).reason,
    );
    res.json({ data: { ...(await show(req, id)), decisionId: decision.id } });
  });
  r.post('/:listingId/unhide', requireRole(...ROLES_MODERATOR), async (req, res) => {
    const id = idOf(req);
    await moderation.unhideListing(currentUser(req), id);
    res.json({ data: await show(req, id) });
  });
  return r;
}
