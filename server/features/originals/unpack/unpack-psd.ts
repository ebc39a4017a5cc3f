import { readPsd, type Psd } from 'ag-psd';
import type { RgbaImage } from '../../../lib/image/rgba-image';
import { ensureAgPsdImageData } from './ag-psd-setup';
import { buildMotif, motifBaseName, trimBox, type MotifEncodeSettings } from './build-motif';
import { planMotifs } from './cut-plan';
import { EncodeQueue } from './encode-queue';
import { layerOpacity, textOf } from './layer-features';
import { sourcePathOf } from './layer-names';
import { buildLayerTree, countLayers } from './layer-tree';
import { checkLayerBudget } from './psd-budget';
import { checkPsdHeader, type PsdHeader } from './psd-header';
import { renderPlannedMotif, type RenderContext } from './render-motif';
import { scanLayerRecords } from './scan-layer-records';
import { suggestTags } from './suggest-tags';
import { UnpackError } from './unpack-error';
import type { UnpackLimits } from './unpack-limits';
import type { UnpackCut, UnpackedMotif, UnpackProgress, UnpackReport, UnpackResult } from './unpack-result';

export type UnpackContext = {
  outDir: string;
  cut: UnpackCut;
  limits: UnpackLimits;
  originalName?: string;
  onProgress?: (progress: UnpackProgress) => void;
  // each motif as soon as its files are written, so they can be stored while the next decodes
  onMotif?: (motif: UnpackedMotif) => void;
};

// ag-psd refuses more than 16 channels in the header, though the spec allows 56; the header's
// count only describes the merged image, which is never decoded when the file has layers.
const AG_PSD_MAX_CHANNELS = 16;

export async function unpackPsd(file: Buffer, ctx: UnpackContext): Promise<UnpackResult> {
  const started = performance.now();
  const progress = ctx.onProgress ?? (() => {});
  progress({ phase: 'reading', percent: 0 });
  const check = checkPsdHeader(file, { maxDocumentPixels: ctx.limits.maxDocumentPixels });
  if (!check.ok) throw new UnpackError(check.error.code, check.error.message);
  const { header } = check;
  const scan = scanLayerRecords(file, header.version);
  checkLayerBudget(scan, ctx.limits);
  if (scan.records.length === 0) return unpackMergedImage(file, header, ctx, started);

  if (header.channels > AG_PSD_MAX_CHANNELS) file.writeUInt16BE(AG_PSD_MAX_CHANNELS, 12);
  const psd = readStructure(file, { skipLayerImageData: true, skipCompositeImageData: true });
  const tree = buildLayerTree(psd, scan);
  const parseMs = performance.now() - started;
  progress({ phase: 'reading', percent: 10 });

  const report: UnpackReport = { skipped: [], unsupported: [], notes: [] };
  const plans = planMotifs(tree, ctx.cut, report);
  const settings = encodeSettings(ctx, psd);
  const renderContext: RenderContext = {
    file, large: scan.large, colourModeCode: header.colourModeCode, report,
    document: { left: 0, top: 0, right: header.width, bottom: header.height },
    maxCanvasPixels: ctx.limits.maxLayerPixels,
  };
  const queue = new EncodeQueue<UnpackedMotif>(ctx.limits.encodesInFlight);
  let cutMs = 0;
  let motifCount = 0;
  for (const [i, plan] of plans.entries()) {
    const cutStarted = performance.now();
    const image = renderPlannedMotif(plan, renderContext);
    const crop = image ? trimBox(image) : null;
    cutMs += performance.now() - cutStarted;
    if (!image || !crop) {
      report.skipped.push({ sourcePath: sourcePathOf(plan.path), reason: plan.node.children ? 'empty group' : 'empty layer' });
      continue;
    }
    const layer = plan.node.layer;
    const text = plan.kind === 'text' ? textOf(layer) : undefined;
    const metadata = {
      name: plan.node.name,
      sourcePath: sourcePathOf(plan.path),
      kind: plan.kind,
      hidden: plan.hidden,
      opacity: layerOpacity(layer),
      blendMode: layer.blendMode ?? (plan.node.children ? 'pass through' : 'normal'),
      ...(text ? { text } : {}),
      suggestedTags: suggestTags([...plan.path].reverse()),
    };
    const baseName = motifBaseName(motifCount++);
    await queue.add(() => buildMotif(image, crop, metadata, baseName, settings).then(announce(ctx)));
    progress({ phase: 'cutting', percent: 10 + Math.round((85 * (i + 1)) / plans.length) });
  }
  progress({ phase: 'encoding', percent: 95 });
  const motifs = await queue.drain();
  progress({ phase: 'finishing', percent: 99 });
  if (report.notes.length > 0 || report.skipped.length > 0) dedupe(report);
  return {
    document: documentOf(header, countLayers(tree), settings.ppi),
    motifs,
    report,
    timings: { parseMs: round(parseMs), cutMs: round(cutMs), encodeMs: round(performance.now() - started - parseMs - cutMs) },
  };
}

// A PSD without layer records holds only its merged image: that becomes the one motif.
async function unpackMergedImage(file: Buffer, header: PsdHeader, ctx: UnpackContext, started: number): Promise<UnpackResult> {
  if (header.channels > AG_PSD_MAX_CHANNELS) {
    throw new UnpackError('psd.bad_channels', `A PSD without layers and with ${header.channels} channels is not supported; save it with layers or as RGB`);
  }
  ensureAgPsdImageData();
  const bytes = header.width * header.height * 4;
  const psd = readStructure(file, { useImageData: true, skipLayerImageData: true, skipCompositeImageData: false, totalMemoryLimit: bytes + 1024 * 1024 });
  const parseMs = performance.now() - started;
  const pixels = psd.imageData?.data;
  if (!pixels || pixels.length !== bytes) throw new UnpackError('psd.corrupt', 'The PSD file has neither layers nor a readable merged image');
  const image: RgbaImage = { data: new Uint8Array(pixels.buffer, pixels.byteOffset, pixels.length), width: header.width, height: header.height, left: 0, top: 0 };
  const report: UnpackReport = { skipped: [], unsupported: [], notes: ['The file has no layers; its merged image is one motif'] };
  const settings = encodeSettings(ctx, psd);
  const crop = trimBox(image);
  const cutMs = performance.now() - started - parseMs;
  const motifs: UnpackedMotif[] = [];
  const name = ctx.originalName ? nameFromFileName(ctx.originalName) : 'Background';
  if (crop) {
    motifs.push(await buildMotif(image, crop, {
      name, sourcePath: sourcePathOf([name]), kind: 'layer', hidden: false, opacity: 1, blendMode: 'normal', suggestedTags: suggestTags([name]),
    }, motifBaseName(0), settings));
  } else {
    report.skipped.push({ sourcePath: sourcePathOf([name]), reason: 'empty image' });
  }
  return {
    document: documentOf(header, 0, settings.ppi),
    motifs,
    report,
    timings: { parseMs: round(parseMs), cutMs: round(cutMs), encodeMs: round(performance.now() - started - parseMs - cutMs) },
  };
}

function announce(ctx: Pick<UnpackContext, 'onMotif'>) {
  return (motif: UnpackedMotif): UnpackedMotif => {
    ctx.onMotif?.(motif);
    return motif;
  };
}

function readStructure(file: Buffer, options: Parameters<typeof readPsd>[1]): Psd {
  // ag-psd's text-engine parser prints every odd byte of a damaged file with console.log; the
  // read is synchronous, so muting it for the call cannot hide anyone else's output
  const log = console.log;
  console.log = () => {};
  try {
    return readPsd(file, { skipThumbnail: true, skipLinkedFilesData: true, skipCompositeImageData: true, ...options });
  } catch (error) {
    if (error instanceof UnpackError) throw error;
    const reason = error instanceof Error ? error.message.replace(/[^\x20-\x7e]/g, '?').slice(0, 120) : 'unknown reason';
    const code = /exceeds file size|past end|out of range|outside the bounds/i.test(reason) ? 'psd.truncated' : 'psd.corrupt';
    throw new UnpackError(code, `The PSD file could not be read (${reason}); it is damaged or truncated`);
  } finally {
    console.log = log;
  }
}

function encodeSettings(ctx: UnpackContext, psd: Psd): MotifEncodeSettings {
  const info = psd.imageResources?.resolutionInfo;
  let ppi: number | undefined;
  if (info && Number.isFinite(info.horizontalResolution) && info.horizontalResolution > 0) {
    ppi = info.horizontalResolutionUnit === 'PPCM' ? info.horizontalResolution * 2.54 : info.horizontalResolution;
    ppi = Math.round(ppi * 100) / 100;
  }
  return { outDir: ctx.outDir, pngCompressionLevel: ctx.limits.pngCompressionLevel, ...(ppi ? { ppi } : {}) };
}

function documentOf(header: PsdHeader, layerCount: number, ppi: number | undefined): UnpackResult['document'] {
  return { width: header.width, height: header.height, colourMode: header.colourMode, depth: header.depth, layerCount, ...(ppi ? { ppi } : {}) };
}

export function nameFromFileName(fileName: string): string {
  const base = fileName.split(/[\\/]/).pop() ?? fileName;
  return base.replace(/\.[a-z0-9]{2,5}$/i, '') || 'Untitled';
}

function dedupe(report: UnpackReport): void {
  report.notes = [...new Set(report.notes)];
}

function round(ms: number): number {
  return Math.round(ms * 10) / 10;
}
