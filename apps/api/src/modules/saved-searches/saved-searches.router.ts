import { Router } from 'express';
import { idParam, savedSearchInputSchema, type SavedSearchDto } from '@app/shared';
import { currentUser, requireAuth } from '../../middleware/require-auth';
import type { SavedSearch } from '../../models';
import * as saved from './saved-searches.service';

const params = idParam('savedSearchId');
const toDto = (s: SavedSearch): SavedSearchDto => ({
  id: s.id,
  name: s.name,
  criteria: s.criteria,
  createdAt: s.createdAt.toISOString(),
});

/** `/api/saved-searches`: the member's saved exchange searches. */
export function savedSearchesRouter() {
  const r = Router();
  r.use(requireAuth());
  r.get('/', async (req, res) => {
    res.json({ data: (await saved.listSavedSearches(currentUser(req))).map(toDto) });
  });
  r.post('/', async (req, res) => {
    const input = savedSearchInputSchema.parse(req.body);
    const s = await saved.createSavedSearch(currentUser(req), input.name, input.criteria);
    res.status(201).json({ data: toDto(s) });
  });
  r.delete('/:savedSearchId', async (req, res) => {
    const { savedSearchId } = params.parse(req.params);
    await saved.deleteSavedSearch(currentUser(req), Number(savedSearchId));
    res.status(204).end();
  });
  return r;
}
