import { randomUUID } from 'node:crypto';
import type { TemplateEntry } from '../../../shared/contracts/products';
import { builtInTemplates, findBuiltInTemplate } from '../../../shared/templates/built-in-templates';
import { parseTemplate, type Template } from '../../../shared/templates/template-schema';
import { badRequest, conflict, notFound } from '../../lib/http-error';
import type { TemplatesRepository } from './templates.repository';

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function validTemplate(input: unknown, id: string): Template {
  const parsed = parseTemplate({ ...(typeof input === 'object' && input ? input : {}), id });
  if (!parsed.ok) throw badRequest('template.invalid', parsed.error.message, parsed.error.fields);
  return parsed.template;
}

export function createTemplatesService(repo: TemplatesRepository) {
  return {
    async list(studioId: string): Promise<TemplateEntry[]> {
      const [own, counts] = await Promise.all([repo.listStudio(studioId), repo.productCounts(studioId)]);
      return [
        ...builtInTemplates.map((template) => ({ template, source: 'built-in' as const, guideImageUrl: null, productCount: counts.get(template.id) ?? 0 })),
        ...own.map((row) => ({ template: row.spec, source: 'studio' as const, guideImageUrl: null, productCount: counts.get(row.id) ?? 0 })),
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

    async remove(studioId: string, id: string) {
      if (!(await repo.find(studioId, id))) throw notFound('That template');
      const used = (await repo.productCounts(studioId)).get(id) ?? 0;
      if (used > 0) throw conflict('template.in_use', `${used} product${used === 1 ? ' uses' : 's use'} this template; move them to another template first.`);
      await repo.remove(studioId, id);
    },
  };
}

export type TemplatesService = ReturnType<typeof createTemplatesService>;
