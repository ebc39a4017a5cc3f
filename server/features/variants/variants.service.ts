import type { ProductVariant, VariantOptions } from '../../../shared/contracts/variants';
import { badRequest, conflict, notFound } from '../../lib/http-error';
import type { TemplatesService } from '../templates/templates.service';
import { isSkuTaken, type VariantFields, type VariantRow, type VariantsRepository } from './variants.repository';

type Actor = { studioId: string; userId: string };
type Product = { id: string; name: string; templateId: string };

function view(row: VariantRow): ProductVariant {
  return { id: row.id, productId: row.productId, name: row.name, sku: row.sku, options: row.options as VariantOptions, position: row.position };
}

export function createVariantsService(repo: VariantsRepository, templates: TemplatesService) {
  async function productOf(studioId: string, productId: string) {
    const product = await repo.product(studioId, productId);
    if (!product) throw notFound('That product');
    return product;
  }

  async function skuTakenError(studioId: string, sku: string, exceptId?: string) {
    const holder = await repo.skuHolder(studioId, sku, exceptId);
    const where = holder ? ` by “${holder.productName}” (${holder.variantName})` : ' in this studio';
    return conflict('variant.sku_taken', `The SKU “${sku}” is already used${where}. Each variant needs its own SKU so sales map to it.`);
  }

  // Checked before writing so the message can name the holder; the unique index still guards a race.
  async function checkFields(actor: Actor, product: Product, fields: VariantFields & { options?: VariantOptions }, exceptId?: string) {
    if (fields.sku && (await repo.skuHolder(actor.studioId, fields.sku, exceptId))) throw await skuTakenError(actor.studioId, fields.sku, exceptId);
    const blank = fields.options?.templateVariantId;
    if (blank) {
      const template = await templates.resolve(actor.studioId, product.templateId).catch(() => null);
      if (!template?.variants.some((v) => v.id === blank)) {
        throw badRequest('variant.unknown_blank', `The template of “${product.name}” has no blank called “${blank}”.`, { templateVariantId: 'Choose one of the template’s blanks' });
      }
    }
  }

  async function write<T>(actor: Actor, sku: string | null | undefined, exceptId: string | undefined, work: () => Promise<T>): Promise<T> {
    try {
      return await work();
    } catch (err) {
      if (sku && isSkuTaken(err)) throw await skuTakenError(actor.studioId, sku, exceptId);
      throw err;
    }
  }

  return {
    async list(studioId: string, productId: string) {
      await productOf(studioId, productId);
      return { variants: (await repo.list(studioId, productId)).map(view) };
    },
    async create(actor: Actor, productId: string, input: { name: string; sku?: string | null; options: VariantOptions }) {
      const product = await productOf(actor.studioId, productId);
      await checkFields(actor, product, input);
      const row = await write(actor, input.sku, undefined, () => repo.insert(actor, product, { name: input.name, sku: input.sku ?? null, options: input.options }));
      return view(row!);
    },
    async update(actor: Actor, productId: string, id: string, input: VariantFields & { options?: VariantOptions }) {
      const product = await productOf(actor.studioId, productId);
      if (!(await repo.find(actor.studioId, productId, id))) throw notFound('That variant');
      await checkFields(actor, product, input, id);
      const row = await write(actor, input.sku, id, () => repo.update(actor, product, id, input));
      if (!row) throw notFound('That variant');
      return view(row);
    },
    async remove(actor: Actor, productId: string, id: string) {
      const product = await productOf(actor.studioId, productId);
      if (!(await repo.remove(actor, product, id))) throw notFound('That variant');
    },
  };
}

export type VariantsService = ReturnType<typeof createVariantsService>;
