import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { z } from 'zod';
import {
  boardQuerySchema,
  buddyInputSchema,
  readinessInputSchema,
  stormChecklistSchema,
  stormCloseSchema,
  stormWatchInputSchema,
} from '@app/shared';
import { currentUser, requireAuth, requireRole } from '../../middleware/require-auth';
import { recordAudit } from '../audit/audit.service';
import { listHarbors } from '../club/club.service';
import { STORM_CAUTIONS } from './storm-check';
import { boardCsv, toStormWatchDto } from './storm.presenter';
import * as readiness from './storm-readiness.service';
import * as storm from './storm.service';
import { ROLES_MODERATOR_OR_ADMIN } from '../../policies/roles';

const watchParams = z.object({ watchId: z.coerce.number().int().positive('Unknown watch') });
const boatParams = watchParams.extend({
  boatId: z.coerce.number().int().positive('Unknown boat'),
});
const manage = requireRole(...ROLES_MODERATOR_OR_ADMIN);

/** Storm watches: moderators and admins open and close them; members fill in their boats. */
export function stormRouter(deps: { sequelize: Sequelize; publicUrl: string }) {
  const r = Router();
  r.use(requireAuth());
  r.get('/checklist', async (_req, res) => {
    res.json({ data: await storm.getChecklist() });
  });
  r.put('/checklist', manage, async (req, res) => {
    const input = stormChecklistSchema.parse(req.body);
    res.json({ data: await storm.setChecklist(currentUser(req), input) });
  });
  r.get('/', async (_req, res) => {
    res.json({ data: (await storm.listWatches()).map(toStormWatchDto) });
  });
  r.post('/', manage, async (req, res) => {
    const input = stormWatchInputSchema.parse(req.body);
    const watch = await storm.openWatch(currentUser(req), input, deps);
    res.status(201).json({ data: toStormWatchDto(watch) });
  });
  r.get('/:watchId', async (req, res) => {
    const { watchId } = watchParams.parse(req.params);
    const watch = await storm.getWatch(watchId);
    const own = await readiness.mineAndBuddied(currentUser(req), watch);
    res.json({ data: { watch: toStormWatchDto(watch), ...own, cautions: STORM_CAUTIONS } });
  });
  r.post('/:watchId/close', manage, async (req, res) => {
    const { watchId } = watchParams.parse(req.params);
    const input = stormCloseSchema.parse(req.body);
    res.json({ data: toStormWatchDto(await storm.closeWatch(currentUser(req), watchId, input)) });
  });
  r.get('/:watchId/board', async (req, res) => {
    const { watchId } = watchParams.parse(req.params);
    const { harborId } = boardQuerySchema.parse(req.query);
    const { watch, rows } = await readiness.board(currentUser(req), watchId, harborId);
    res.json({ data: { watch: toStormWatchDto(watch), rows } });
  });
  r.get('/:watchId/board.csv', manage, async (req, res) => {
    const { watchId } = watchParams.parse(req.params);
    const { harborId } = boardQuerySchema.parse(req.query);
    const actor = currentUser(req);
    const { watch, rows } = await readiness.board(actor, watchId, harborId);
    const csv = boardCsv(watch, rows, await listHarbors());
    await recordAudit({
      actorId: actor.id,
      area: 'storm',
      action: 'board.export',
      subjectType: 'storm_watch',
      subjectId: String(watch.id),
    });
    res
      .type('text/csv; charset=utf-8')
      .attachment(`storm-watch-${watch.id}-board-${new Date().toISOString().slice(0, 10)}.csv`)
      .send(csv);
  });
  r.get('/:watchId/buddies', manage, async (req, res) => {
    watchParams.parse(req.params);
    const people = await storm.buddyCandidates();
    res.json({ data: people.map((u) => ({ id: u.id, name: u.displayName })) });
  });
  r.get('/:watchId/boats/:boatId', async (req, res) => {
    const { watchId, boatId } = boatParams.parse(req.params);
    const { watch, readiness: row } = await readiness.getReadiness(
      currentUser(req),
      watchId,
      boatId,
    );
    res.json({ data: { watch: toStormWatchDto(watch), readiness: row } });
  });
  r.put('/:watchId/boats/:boatId', async (req, res) => {
    const { watchId, boatId } = boatParams.parse(req.params);
    const input = readinessInputSchema.parse(req.body);
    const { readiness: row } = await readiness.saveReadiness(
      currentUser(req),
      watchId,
      boatId,
      input,
    );
    res.json({ data: row });
  });
  r.put('/:watchId/boats/:boatId/buddy', manage, async (req, res) => {
    const { watchId, boatId } = boatParams.parse(req.params);
    const { buddyUserId } = buddyInputSchema.parse(req.body);
    const { readiness: row } = await readiness.setBuddy(
      currentUser(req),
      watchId,
      boatId,
      buddyUserId,
    );
    res.json({ data: row });
  });
  return r;
}
