import { mergeTagsRequestSchema, renameTagRequestSchema } from '../../../shared/contracts/collections';
import { badRequest } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { parseBody } from '../../middleware/validate';
import type { TagsRepository } from './tags.repository';

// Small enough that the repository is the service: list, and rename as a merge of one.
export function tagsRouter(repo: TagsRepository) {
  const r = createRoutes('/api/tags');

  r.get('/', 'studio.read', async (req, res) => {
    res.json({ tags: await repo.list(studioAuth(req).studioId) });
  });

  r.post('/rename', 'motifs.edit', async (req, res) => {
    const { studioId } = studioAuth(req);
    const { from, to } = parseBody(req, renameTagRequestSchema);
    if (from === to) throw badRequest('tags.same_name', 'The new name is the same as the old one.');
    const changed = await repo.merge(studioId, [from], to);
    res.json({ changed, tags: await repo.list(studioId) });
  });

  r.post('/merge', 'motifs.edit', async (req, res) => {
    const { studioId } = studioAuth(req);
    const { from, into } = parseBody(req, mergeTagsRequestSchema);
    const sources = [...new Set(from)].filter((t) => t !== into);
    if (sources.length === 0) throw badRequest('tags.nothing_to_merge', 'Choose at least one tag other than the one to merge into.');
    const changed = await repo.merge(studioId, sources, into);
    res.json({ changed, tags: await repo.list(studioId) });
  });

  return r.router;
}
