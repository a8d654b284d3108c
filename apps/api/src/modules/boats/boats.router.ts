import { Router } from 'express';
import { boatInputSchema, boatPatchSchema, idParam } from '@app/shared';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import { toBoatDto } from './boats.presenter';
import * as boats from './boats.service';

const params = idParam('boatId');

export function boatsRouter() {
  const r = Router();
  r.use(requireAuth());
  r.get('/', async (req, res) => {
    res.json({ data: (await boats.listBoats(currentUser(req))).map(toBoatDto) });
  });
  r.post('/', async (req, res) => {
    const boat = await boats.createBoat(currentUser(req), boatInputSchema.parse(req.body));
    res.status(201).json({ data: toBoatDto(boat) });
  });
  r.get('/:boatId', async (req, res) => {
    const { boatId } = params.parse(req.params);
    res.json({ data: toBoatDto(await boats.getOwnBoat(currentUser(req), Number(boatId))) });
  });
  r.patch('/:boatId', async (req, res) => {
    const { boatId } = params.parse(req.params);
    const boat = await boats.updateBoat(
      currentUser(req),
      Number(boatId),
      boatPatchSchema.parse(req.body),
    );
    res.json({ data: toBoatDto(boat) });
  });
  r.delete('/:boatId', async (req, res) => {
    const { boatId } = params.parse(req.params);
    await boats.deleteBoat(currentUser(req), Number(boatId));
    res.status(204).end();
  });
  return r;
}
