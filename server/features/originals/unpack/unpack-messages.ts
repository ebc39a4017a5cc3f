import { z } from 'zod';
import { unpackedMotifSchema, unpackResultSchema } from './unpack-result';

// What the parent and the unpack child process say to each other over IPC.
const limitsSchema = z.object({
  maxFileBytes: z.number(), maxDocumentPixels: z.number(), maxLayerPixels: z.number(),
  maxTotalLayerPixels: z.number(), maxLayers: z.number(), timeoutMs: z.number(),
  maxMemoryBytes: z.number(), maxHeapMb: z.number(), encodesInFlight: z.number(), pngCompressionLevel: z.number(),
}).partial();

export const unpackRequestSchema = z.object({
  type: z.literal('unpack'),
  input: z.object({
    filePath: z.string(),
    outDir: z.string(),
    cut: z.enum(['groups', 'layers']),
    originalName: z.string().optional(),
    limits: limitsSchema.optional(),
  }),
});

export const childMessageSchema = z.discriminatedUnion('type', [
  z.object({ type: z.literal('ready') }),
  z.object({ type: z.literal('progress'), phase: z.enum(['reading', 'cutting', 'encoding', 'finishing']), percent: z.number() }),
  // one motif whose PNG and thumbnail are written, ahead of the result (which lists it again)
  z.object({ type: z.literal('motif'), motif: unpackedMotifSchema }),
  z.object({ type: z.literal('result'), result: unpackResultSchema }),
  z.object({ type: z.literal('error'), code: z.string(), message: z.string() }),
]);

export type UnpackRequest = z.infer<typeof unpackRequestSchema>;
export type ChildMessage = z.infer<typeof childMessageSchema>;
