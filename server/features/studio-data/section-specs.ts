import { asc, type SQL } from 'drizzle-orm';
import type { PgColumn, PgTable } from 'drizzle-orm/pg-core';
import type { StudioDataRecordSection } from '../../../shared/contracts/studio-data';
import {
  activityEvents,
  collectionMotifs,
  collections,
  commentThreads,
  comments,
  motifVersions,
  motifs,
  originalMotifs,
  originals,
  productMotifs,
  productVariants,
  products,
  reviewDecisions,
  reviewRequests,
  salesImports,
  salesRows,
  samplePhotos,
  samples,
  stageMoves,
  studioTemplates,
} from '../../db/schema/index';

// How one table of the studio travels in the document: which columns are ids, references,
// people, JSON that may hold ids, and stored-object keys. Export and import both read these.
export type SectionSpec = {
  section: StudioDataRecordSection;
  table: PgTable;
  // tables without studio_id are reached through a parent: this column, among that section's ids
  via?: { column: string; section: StudioDataRecordSection };
  own?: string;
  // references that must be records of the same document
  refs?: Record<string, StudioDataRecordSection>;
  // references that become null when the record is not in the document
  optionalRefs?: Record<string, StudioDataRecordSection>;
  // ids that group records without pointing at one (an original's lineage)
  groupIds?: string[];
  // remapped when they name a record of the document, kept otherwise (a built-in template's id)
  softRefs?: string[];
  // remapped when they name any record of the document, null otherwise (what an activity line is about)
  looseRefs?: string[];
  people?: string[];
  json?: string[];
  // stored-object keys, with the column that knows the object's size
  keys?: { column: string; bytes?: string }[];
  omit?: string[];
  order: () => SQL[];
};

const col = (table: PgTable, name: string) => (table as unknown as Record<string, PgColumn>)[name];
const by = (table: PgTable, ...names: string[]) => () => names.map((n) => asc(col(table, n)));

// In insert order: every table after the ones it refers to.
export const sectionSpecs: SectionSpec[] = [
  {
    section: 'originals', table: originals, own: 'id', optionalRefs: { previousOriginalId: 'originals' }, groupIds: ['lineageId'],
    people: ['uploadedBy'], json: ['report', 'error'], keys: [{ column: 'storageKey', bytes: 'byteSize' }], order: by(originals, 'createdAt', 'id'),
  },
  { section: 'motifs', table: motifs, own: 'id', refs: { originalId: 'originals' }, order: by(motifs, 'createdAt', 'id') },
  {
    section: 'motifVersions', table: motifVersions, own: 'id', refs: { motifId: 'motifs', originalId: 'originals' }, json: ['text', 'colours'],
    keys: [{ column: 'pngKey', bytes: 'pngBytes' }, { column: 'thumbKey' }], order: by(motifVersions, 'motifId', 'version'),
  },
  {
    section: 'originalMotifs', table: originalMotifs, via: { column: 'originalId', section: 'originals' }, refs: { originalId: 'originals', motifId: 'motifs' },
    order: by(originalMotifs, 'originalId', 'position', 'motifId', 'sourcePath'),
  },
  { section: 'collections', table: collections, own: 'id', order: by(collections, 'createdAt', 'id') },
  {
    section: 'collectionMotifs', table: collectionMotifs, via: { column: 'collectionId', section: 'collections' }, refs: { collectionId: 'collections', motifId: 'motifs' },
    order: by(collectionMotifs, 'collectionId', 'motifId'),
  },
  { section: 'templates', table: studioTemplates, own: 'id', json: ['spec'], keys: [{ column: 'guideImageKey' }], order: by(studioTemplates, 'createdAt', 'id') },
  {
    section: 'products', table: products, own: 'id', optionalRefs: { collectionId: 'collections' }, softRefs: ['templateId'], people: ['createdBy'], json: ['layout'],
    order: by(products, 'createdAt', 'id'),
  },
  {
    section: 'productMotifs', table: productMotifs, via: { column: 'productId', section: 'products' }, refs: { productId: 'products', motifId: 'motifs' },
    order: by(productMotifs, 'productId', 'placementId'),
  },
  { section: 'variants', table: productVariants, own: 'id', refs: { productId: 'products' }, json: ['options'], order: by(productVariants, 'productId', 'position', 'createdAt', 'id') },
  { section: 'stageMoves', table: stageMoves, own: 'id', refs: { productId: 'products' }, people: ['movedBy'], order: by(stageMoves, 'createdAt', 'id') },
  { section: 'samples', table: samples, own: 'id', refs: { productId: 'products' }, people: ['verdictBy', 'createdBy'], order: by(samples, 'createdAt', 'id') },
  {
    section: 'samplePhotos', table: samplePhotos, own: 'id', refs: { sampleId: 'samples' }, people: ['createdBy'],
    keys: [{ column: 'originalKey', bytes: 'byteSize' }, { column: 'displayKey' }, { column: 'thumbKey' }], order: by(samplePhotos, 'createdAt', 'id'),
  },
  { section: 'commentThreads', table: commentThreads, own: 'id', refs: { productId: 'products' }, people: ['resolvedBy', 'createdBy'], json: ['anchor'], order: by(commentThreads, 'createdAt', 'id') },
  { section: 'comments', table: comments, own: 'id', refs: { threadId: 'commentThreads' }, people: ['authorId'], order: by(comments, 'createdAt', 'id') },
  { section: 'reviewRequests', table: reviewRequests, own: 'id', refs: { productId: 'products' }, people: ['requestedBy', 'reviewerId'], order: by(reviewRequests, 'createdAt', 'id') },
  { section: 'reviewDecisions', table: reviewDecisions, own: 'id', refs: { productId: 'products' }, people: ['reviewerId'], order: by(reviewDecisions, 'createdAt', 'id') },
  { section: 'salesImports', table: salesImports, own: 'id', people: ['importedBy'], json: ['mapping', 'report'], order: by(salesImports, 'createdAt', 'id') },
  {
    section: 'salesRows', table: salesRows, refs: { importId: 'salesImports' }, optionalRefs: { variantId: 'variants', productId: 'products' }, omit: ['id'],
    order: by(salesRows, 'importId', 'line', 'sku'),
  },
  { section: 'activity', table: activityEvents, own: 'id', looseRefs: ['subjectId'], people: ['actorId'], json: ['data'], order: by(activityEvents, 'createdAt', 'id') },
];

export const columnOf = col;
