import { randomUUID } from 'node:crypto';
import { rm } from 'node:fs/promises';
import type { TemplateEntry } from '../../../shared/contracts/products';
import { builtInTemplates, findBuiltInTemplate } from '../../../shared/templates/built-in-templates';
import { parseTemplate, type Template } from '../../../shared/templates/template-schema';
import { badRequest, conflict, notFound } from '../../lib/http-error';
import type { ObjectStorage } from '../../lib/storage';
import { guideImageKey, prepareGuideImage } from './guide-image';
import type { TemplatesRepository } from './templates.repository';

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function validTemplate(input: unknown, id: string): Template {
  const parsed = parseTemplate({ ...(typeof input === 'object' && input ? input : {}), id });
  if (!parsed.ok) throw badRequest('template.invalid', parsed.error.message, parsed.error.fields);
  return parsed.template;
}

const guideUrl = (row: { id: string; guideImageKey: string | null }) =>
  row.guideImageKey ? `/api/templates/${row.id}/guide-image?v=${encodeURIComponent(row.guideImageKey.split('/').pop() ?? '')}` : null;

export function createTemplatesService(repo: TemplatesRepository, storage: ObjectStorage) {
  const studioRow = async (studioId: string, id: string) => {
    if (!uuidPattern.test(id)) {
      if (findBuiltInTemplate(id)) throw badRequest('template.built_in', 'Built-in templates cannot be changed; start a studio template from it instead.');
      throw notFound('That template');
    }
    const row = await repo.find(studioId, id);
    if (!row) throw notFound('That template');
    return row;
  };

  return {
    async list(studioId: string): Promise<TemplateEntry[]> {
      const [own, counts] = await Promise.all([repo.listStudio(studioId), repo.productCounts(studioId)]);
      return [
        ...builtInTemplates.map((template) => ({ template, source: 'built-in' as const, guideImageUrl: null, productCount: counts.get(template.id) ?? 0 })),
        ...own.map((row) => ({ template: row.spec, source: 'studio' as const, guideImageUrl: guideUrl(row), productCount: counts.get(row.id) ?? 0 })),
      ];
    },

    // Built-in ids are words; studio templates are uuids, so the two never collide.
    async resolve(studioId: string, templateId: string): Promise<Template> {
      const builtIn = findBuiltInTemplate(templateId);
      if (builtIn) return builtIn;
      if (!uuidPattern.test(templateId)) throw notFound('That template');
      const row = await repo.find(studioId, templateId);
      if (!row) throw notFound('That template');
      return row.spec;
    },

    async create(studioId: string, input: unknown): Promise<Template> {
      const id = randomUUID();
      const row = await repo.insert(studioId, id, validTemplate(input, id));
      return row.spec;
    },

    async update(studioId: string, id: string, input: unknown): Promise<Template> {
      const row = await repo.update(studioId, id, validTemplate(input, id));
      if (!row) throw notFound('That template');
      return row.spec;
    },

    // The printer's guide drawing, shown over the editor's canvas and never printed.
    async setGuideImage(studioId: string, id: string, filePath: string): Promise<{ guideImageUrl: string; width: number; height: number }> {
      const row = await studioRow(studioId, id).catch(async (error: unknown) => {
        await rm(filePath, { force: true });
        throw error;
      });
      const image = await prepareGuideImage(filePath);
      const key = guideImageKey(studioId, id, Date.now().toString(36));
      await storage.put(key, image.data, 'image/webp');
      const updated = await repo.setGuideImageKey(studioId, id, key);
      // the old drawing goes only after the row points at the new one
      if (row.guideImageKey) await storage.remove([row.guideImageKey]).catch(() => {});
      return { guideImageUrl: guideUrl(updated ?? { id, guideImageKey: key })!, width: image.width, height: image.height };
    },

    async guideImage(studioId: string, id: string) {
      const row = await studioRow(studioId, id);
      if (!row.guideImageKey) throw notFound('That template\'s guide image');
      return storage.get(row.guideImageKey);
    },

    async removeGuideImage(studioId: string, id: string) {
      const row = await studioRow(studioId, id);
      if (!row.guideImageKey) return;
      await repo.setGuideImageKey(studioId, id, null);
      await storage.remove([row.guideImageKey]).catch(() => {});
    },

    async remove(studioId: string, id: string) {
      const row = await repo.find(studioId, id);
      if (!row) throw notFound('That template');
      const used = (await repo.productCounts(studioId)).get(id) ?? 0;
      if (used > 0) throw conflict('template.in_use', `${used} product${used === 1 ? ' uses' : 's use'} this template; move them to another template first.`);
      await repo.remove(studioId, id);
      if (row.guideImageKey) await storage.remove([row.guideImageKey]).catch(() => {});
    },
  };
}

export type TemplatesService = ReturnType<typeof createTemplatesService>;
