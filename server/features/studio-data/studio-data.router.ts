import { studioDataDocumentSchema } from '../../../shared/contracts/studio-data';
import type { Database } from '../../db/client';
import { badRequest } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import type { ObjectStorage } from '../../lib/storage';
import { studioAuth } from '../../middleware/auth';
import { exportStudioData } from './studio-data-export';
import { importStudioData } from './studio-data-import';

const fileName = (name: string, day: string) => `${name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'studio'}-data-${day}.json`;

function parseDocument(body: unknown) {
  const parsed = studioDataDocumentSchema.safeParse(body);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  const path = issue.path.join('.') || '(the whole file)';
  throw badRequest('studio_data.invalid', `The file has a problem at ${path}: ${issue.message}`, { [path]: issue.message });
}

// Keeping the studio's data: the owner's export of every record, and its import into an empty studio.
export function studioDataRouter(deps: { db: Database; storage: ObjectStorage }) {
  const r = createRoutes('/api/studio');

  r.get('/data-export', 'studio.data', async (req, res) => {
    const doc = await exportStudioData(deps.db, studioAuth(req).studioId);
    res.attachment(fileName(doc.studio.name, doc.exportedAt.slice(0, 10))).json(doc);
  });

  r.post('/data-import', 'studio.data', async (req, res) => {
    const auth = studioAuth(req);
    const doc = parseDocument(req.body);
    res.json(await importStudioData(deps, { studioId: auth.studioId, userId: auth.user.id }, doc));
  });

  return r.router;
}
