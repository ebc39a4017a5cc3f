import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { rm } from 'node:fs/promises';
import type { LatestSample, ProductSamplesResponse, Sample, SamplePhoto } from '../../../shared/contracts/samples';
import type { createSampleRequestSchema, sampleVerdictRequestSchema, updateSampleRequestSchema } from '../../../shared/contracts/samples';
import { checkCurrency, minorToInput, parseCostToMinor } from '../../../shared/samples/money';
import { checkSampleDates } from '../../../shared/samples/sample-dates';
import { badRequest, notFound } from '../../lib/http-error';
import type { ObjectStorage } from '../../lib/storage';
import { recordActivity } from '../activity/record-activity';
import { cleanFileName } from '../originals/originals.service';
import { preparePhoto } from './sample-photo-images';
import type { SamplePhotoRow, SamplesRepository, SampleWithPeople } from './samples.repository';
import type { z } from 'zod';

type Deps = { repo: SamplesRepository; storage: ObjectStorage; maxPixels: number; photoLimitBytes: number };
type CreateInput = z.output<typeof createSampleRequestSchema>;
type UpdateInput = z.output<typeof updateSampleRequestSchema>;
type VerdictInput = z.output<typeof sampleVerdictRequestSchema>;

export const samplePhotoKeys = (studioId: string, sampleId: string, photoId: string) => {
  const base = `studios/${studioId}/samples/${sampleId}/photos/${photoId}`;
  return { original: `${base}/original`, display: `${base}/display.webp`, thumb: `${base}/thumb.webp` };
};

export function toSamplePhoto(row: SamplePhotoRow): SamplePhoto {
  const url = (size: string) => `/api/sample-photos/${row.id}/${size}`;
  return {
    id: row.id,
    sampleId: row.sampleId,
    fileName: row.fileName,
    contentType: row.contentType,
    byteSize: row.byteSize,
    width: row.width,
    height: row.height,
    thumbUrl: url('thumb'),
    displayUrl: url('display'),
    originalUrl: url('original'),
    createdAt: row.createdAt.toISOString(),
  };
}

function toSample({ sample: s, createdBy, verdictBy }: SampleWithPeople, photos: SamplePhotoRow[]): Sample {
  return {
    id: s.id,
    productId: s.productId,
    orderedOn: s.orderedOn,
    printer: s.printer,
    costMinor: s.costMinor,
    currency: s.currency,
    expectedOn: s.expectedOn,
    receivedOn: s.receivedOn,
    notes: s.notes,
    verdict: s.verdict,
    verdictNotes: s.verdictNotes,
    verdictBy,
    verdictAt: s.verdictAt?.toISOString() ?? null,
    createdBy,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
    photos: photos.filter((p) => p.sampleId === s.id).map(toSamplePhoto),
  };
}

// Cost text + currency -> minor units, with the same codes on create and update.
function moneyOf(costText: string | null | undefined, currencyText: string | null | undefined): { costMinor: number | null; currency: string | null } {
  const cost = costText?.trim() ?? '';
  const code = currencyText?.trim() ?? '';
  if (!code) {
    if (cost) throw badRequest('sample.currency_required', 'Choose the currency of the cost (for example GBP or EUR).', { currency: 'Choose a currency' });
    return { costMinor: null, currency: null };
  }
  const currency = checkCurrency(code);
  if ('code' in currency) throw badRequest(currency.code, currency.message, { currency: currency.message });
  if (!cost) return { costMinor: null, currency: currency.currency };
  const parsed = parseCostToMinor(cost, currency.currency);
  if ('code' in parsed) throw badRequest(parsed.code, parsed.message, { cost: parsed.message });
  return { costMinor: parsed.minor, currency: currency.currency };
}

function checkDates(dates: Parameters<typeof checkSampleDates>[0]) {
  const problem = checkSampleDates(dates);
  if (problem) throw badRequest(problem.code, problem.message, { [problem.field]: problem.message });
}

export function createSamplesService({ repo, storage, maxPixels, photoLimitBytes }: Deps) {
  async function sampleOrThrow(studioId: string, id: string) {
    const row = await repo.find(studioId, id);
    if (!row) throw notFound('That sample');
    return row;
  }

  // The rows are gone already: a storage fault leaves unreferenced files, never a half-deleted sample.
  async function removeObjects(keys: string[]) {
    try {
      await storage.remove(keys);
    } catch (err) {
      console.error(`[samples] could not remove ${keys.length} stored photo files:`, (err as Error).message);
    }
  }

  async function detail(studioId: string, id: string): Promise<Sample> {
    const row = await repo.findWithPeople(studioId, id);
    if (!row) throw notFound('That sample');
    return toSample(row, await repo.photosOf([id]));
  }

  return {
    detail,

    async listForProduct(studioId: string, productId: string): Promise<ProductSamplesResponse> {
      if (!(await repo.productExists(studioId, productId))) throw notFound('That product');
      const rows = await repo.listForProduct(studioId, productId);
      const photos = await repo.photosOf(rows.map((r) => r.sample.id));
      const latest = rows[0]?.sample;
      const latestSample: LatestSample | null = latest ? { id: latest.id, orderedOn: latest.orderedOn, verdict: latest.verdict, verdictAt: latest.verdictAt?.toISOString() ?? null } : null;
      return { samples: rows.map((r) => toSample(r, photos)), latestSample, photoLimitBytes };
    },

    async record(studioId: string, userId: string, productId: string, input: CreateInput): Promise<Sample> {
      const product = await repo.productExists(studioId, productId);
      if (!product) throw notFound('That product');
      const dates = { orderedOn: input.orderedOn, expectedOn: input.expectedOn ?? null, receivedOn: input.receivedOn ?? null };
      checkDates(dates);
      const money = moneyOf(input.cost, input.currency);
      const row = await repo.db.transaction(async (tx) => {
        const inserted = await repo.insert(tx, { studioId, productId, ...dates, ...money, printer: input.printer, notes: input.notes ?? '', createdBy: userId });
        await recordActivity(tx, {
          studioId,
          actorId: userId,
          kind: 'sample.recorded',
          subjectType: 'sample',
          subjectId: inserted.id,
          summary: `recorded a sample of "${product.name}"${input.printer ? ` from ${input.printer}` : ''}`,
          data: { productId, orderedOn: inserted.orderedOn },
        });
        return inserted;
      });
      return detail(studioId, row.id);
    },

    async update(studioId: string, id: string, input: UpdateInput): Promise<Sample> {
      const row = await sampleOrThrow(studioId, id);
      const dates = {
        orderedOn: input.orderedOn ?? row.orderedOn,
        expectedOn: input.expectedOn === undefined ? row.expectedOn : input.expectedOn,
        receivedOn: input.receivedOn === undefined ? row.receivedOn : input.receivedOn,
      };
      checkDates(dates);
      const changes: Parameters<SamplesRepository['update']>[3] = { ...dates };
      if (input.printer !== undefined) changes.printer = input.printer;
      if (input.notes !== undefined) changes.notes = input.notes;
      if (input.cost !== undefined || input.currency !== undefined) {
        // A new currency alone re-reads the stored amount in it, so ¥ never inherits pence.
        const currency = input.currency === undefined ? row.currency : input.currency;
        const cost = input.cost !== undefined ? input.cost : row.costMinor !== null && row.currency ? minorToInput(row.costMinor, row.currency) : null;
        Object.assign(changes, moneyOf(cost, currency));
      }
      await repo.db.transaction((tx) => repo.update(tx, studioId, id, changes));
      return detail(studioId, id);
    },

    async verdict(studioId: string, userId: string, id: string, input: VerdictInput): Promise<Sample> {
      const row = await sampleOrThrow(studioId, id);
      if (input.verdict === 'changes_needed' && !input.notes) {
        throw badRequest('sample.notes_required', 'Say what needs to change, so the next sample can get it right.', { notes: 'Say what needs to change' });
      }
      const productName = await repo.productName(row.productId);
      await repo.db.transaction(async (tx) => {
        await repo.update(tx, studioId, id, { verdict: input.verdict, verdictNotes: input.notes, verdictBy: userId, verdictAt: new Date() });
        await recordActivity(tx, {
          studioId,
          actorId: userId,
          kind: 'sample.verdict',
          subjectType: 'sample',
          subjectId: id,
          summary: input.verdict === 'approved' ? `approved the sample of "${productName}"` : `asked for changes to the sample of "${productName}"`,
          data: { productId: row.productId, verdict: input.verdict, notes: input.notes },
        });
      });
      return detail(studioId, id);
    },

    // Rows first (the photos go with their sample by cascade), then the stored objects.
    async remove(studioId: string, id: string): Promise<void> {
      await sampleOrThrow(studioId, id);
      const photos = await repo.photosOf([id]);
      await repo.remove(studioId, id);
      await removeObjects(photos.flatMap((p) => [p.originalKey, p.displayKey, p.thumbKey]));
    },

    async addPhoto(input: { studioId: string; userId: string; sampleId: string; filePath: string; fileName: string; byteSize: number }): Promise<SamplePhoto> {
      try {
        await sampleOrThrow(input.studioId, input.sampleId);
        const prepared = await preparePhoto(input.filePath, maxPixels);
        const id = randomUUID();
        const keys = samplePhotoKeys(input.studioId, input.sampleId, id);
        try {
          // The photo goes up byte for byte as sent; only the two smaller copies are re-encoded.
          await storage.put(keys.original, createReadStream(input.filePath), prepared.contentType, { contentLength: input.byteSize });
          await storage.put(keys.display, prepared.display, 'image/webp');
          await storage.put(keys.thumb, prepared.thumb, 'image/webp');
          const row = await repo.insertPhoto({
            id,
            studioId: input.studioId,
            sampleId: input.sampleId,
            fileName: cleanFileName(input.fileName),
            contentType: prepared.contentType,
            byteSize: input.byteSize,
            width: prepared.width,
            height: prepared.height,
            originalKey: keys.original,
            displayKey: keys.display,
            thumbKey: keys.thumb,
            createdBy: input.userId,
          });
          return toSamplePhoto(row);
        } catch (err) {
          await storage.remove(Object.values(keys)).catch(() => {});
          throw err;
        }
      } finally {
        await rm(input.filePath, { force: true });
      }
    },

    async photo(studioId: string, id: string): Promise<SamplePhotoRow> {
      const row = await repo.findPhoto(studioId, id);
      if (!row) throw notFound('That photo');
      return row;
    },

    async removePhoto(studioId: string, id: string): Promise<void> {
      const row = await repo.findPhoto(studioId, id);
      if (!row) throw notFound('That photo');
      await repo.removePhoto(studioId, id);
      await removeObjects([row.originalKey, row.displayKey, row.thumbKey]);
    },
  };
}

export type SamplesService = ReturnType<typeof createSamplesService>;
