import { z } from 'zod';
import { isCalendarDate } from '../samples/sample-dates';

export const sampleVerdicts = ['pending', 'approved', 'changes_needed'] as const;
export const sampleVerdictSchema = z.enum(sampleVerdicts);
export type SampleVerdictValue = z.infer<typeof sampleVerdictSchema>;

const calendarDate = z.string().trim().refine(isCalendarDate, 'Use a date such as 2026-03-14');
const optionalDate = z.union([calendarDate, z.literal(''), z.null()]).optional().transform((v) => (v ? v : v === undefined ? undefined : null));
const optionalText = (max: number) => z.union([z.string().trim().max(max), z.null()]).optional();

// `cost` is the amount as the user typed it ("12.50"); the server turns it into minor units of `currency`.
export const createSampleRequestSchema = z.object({
  orderedOn: calendarDate,
  printer: z.string().trim().max(200, 'Keep the printer to 200 characters').default(''),
  cost: optionalText(40),
  currency: optionalText(8),
  expectedOn: optionalDate,
  receivedOn: optionalDate,
  notes: z.string().trim().max(4000, 'Keep the notes to 4000 characters').optional(),
});
export type CreateSampleRequest = z.input<typeof createSampleRequestSchema>;

export const updateSampleRequestSchema = z.object({
  orderedOn: calendarDate.optional(),
  printer: z.string().trim().max(200, 'Keep the printer to 200 characters').optional(),
  cost: optionalText(40),
  currency: optionalText(8),
  expectedOn: optionalDate,
  receivedOn: optionalDate,
  notes: z.string().trim().max(4000, 'Keep the notes to 4000 characters').optional(),
});
export type UpdateSampleRequest = z.input<typeof updateSampleRequestSchema>;

export const sampleVerdictRequestSchema = z.object({
  verdict: z.enum(['approved', 'changes_needed']),
  notes: z.string().trim().max(4000, 'Keep the notes to 4000 characters').default(''),
});
export type SampleVerdictRequest = z.input<typeof sampleVerdictRequestSchema>;

const personSchema = z.object({ id: z.string(), name: z.string() }).nullable();

export const samplePhotoSchema = z.object({
  id: z.string(),
  sampleId: z.string(),
  fileName: z.string(),
  contentType: z.string(),
  byteSize: z.number(),
  // after EXIF orientation: what the person sees
  width: z.number(),
  height: z.number(),
  thumbUrl: z.string(),
  displayUrl: z.string(),
  originalUrl: z.string(),
  createdAt: z.string(),
});
export type SamplePhoto = z.infer<typeof samplePhotoSchema>;

export const sampleSchema = z.object({
  id: z.string(),
  productId: z.string(),
  orderedOn: z.string(),
  printer: z.string(),
  costMinor: z.number().nullable(),
  currency: z.string().nullable(),
  expectedOn: z.string().nullable(),
  receivedOn: z.string().nullable(),
  notes: z.string(),
  verdict: sampleVerdictSchema,
  verdictNotes: z.string(),
  verdictBy: personSchema,
  verdictAt: z.string().nullable(),
  createdBy: personSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
  photos: z.array(samplePhotoSchema),
});
export type Sample = z.infer<typeof sampleSchema>;

// The sample that decides the product's gate: the latest by orderedOn, then createdAt.
export const latestSampleSchema = z.object({
  id: z.string(),
  orderedOn: z.string(),
  verdict: sampleVerdictSchema,
  verdictAt: z.string().nullable(),
});
export type LatestSample = z.infer<typeof latestSampleSchema>;

export const productSamplesResponseSchema = z.object({
  samples: z.array(sampleSchema),
  latestSample: latestSampleSchema.nullable(),
  // the largest photo the server takes, so the page can refuse bigger ones before sending
  photoLimitBytes: z.number(),
});
export type ProductSamplesResponse = z.infer<typeof productSamplesResponseSchema>;

export const uploadSamplePhotoResponseSchema = samplePhotoSchema;
