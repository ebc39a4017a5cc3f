import { z } from 'zod';

// The shapes that cross the child-process boundary; the parent parses every message with them.
export const dominantColourSchema = z.object({
  hex: z.string(),
  share: z.number(),
  oklab: z.object({ l: z.number(), a: z.number(), b: z.number() }),
});

export const unpackedMotifSchema = z.object({
  // layer or group name, cleaned of control characters; plain text, never markup
  name: z.string(),
  // 'Group/Layer', with '\' and '/' inside names escaped as '\\' and '\/'
  sourcePath: z.string(),
  // 'image' for a flat PNG, JPEG or WebP upload or an SVG drawing
  kind: z.enum(['group', 'layer', 'text', 'image']),
  // hidden in the original; imported anyway
  hidden: z.boolean(),
  // trimmed to the non-transparent pixels, in the original's pixel grid
  left: z.number().int(),
  top: z.number().int(),
  width: z.number().int().positive(),
  height: z.number().int().positive(),
  // of the layer or group itself (not baked into the pixels)
  opacity: z.number().min(0).max(1),
  blendMode: z.string(),
  text: z.object({ content: z.string(), fontName: z.string().optional(), sizePt: z.number().optional() }).optional(),
  // file names relative to outDir
  pngFile: z.string(),
  thumbFile: z.string(),
  // sha256 hex of uint32 BE width, uint32 BE height, then the RGBA bytes row by row
  contentHash: z.string().regex(/^[0-9a-f]{64}$/),
  dhash: z.string(),
  colours: z.array(dominantColourSchema),
  suggestedTags: z.array(z.string()),
});

export const unpackResultSchema = z.object({
  document: z.object({
    width: z.number().int(),
    height: z.number().int(),
    colourMode: z.string(),
    depth: z.number().int(),
    layerCount: z.number().int(),
    // pixels per inch from the file's resolution, when it has one
    ppi: z.number().optional(),
  }),
  motifs: z.array(unpackedMotifSchema),
  report: z.object({
    skipped: z.array(z.object({ sourcePath: z.string(), reason: z.string() })),
    unsupported: z.array(z.object({ sourcePath: z.string(), feature: z.string() })),
    notes: z.array(z.string()),
    // parts of an SVG removed before drawing because they could run or reach outside the file
    leftOut: z.array(z.string()).optional(),
  }),
  timings: z.object({ parseMs: z.number(), cutMs: z.number(), encodeMs: z.number() }),
  // filled in by runUnpack from the child process
  resources: z.object({ peakRssBytes: z.number(), wallMs: z.number(), cpuMs: z.number().optional() }).optional(),
});

export type DominantColourValue = z.infer<typeof dominantColourSchema>;
export type UnpackedMotif = z.infer<typeof unpackedMotifSchema>;
export type UnpackResult = z.infer<typeof unpackResultSchema>;
export type UnpackReport = UnpackResult['report'];

export type UnpackPhase = 'reading' | 'cutting' | 'encoding' | 'finishing';
export type UnpackProgress = { phase: UnpackPhase; percent: number };
export type UnpackCut = 'groups' | 'layers';
