import { ZipArchive } from 'archiver';
import { PassThrough } from 'node:stream';
import type { PreflightReport } from '../../../shared/preflight';
import type { Template } from '../../../shared/templates';
import type { MotifVersionRecord } from './exports.repository';
import type { ManifestVariant } from './variant-print-files';

export type BundleEntry = { name: string; data: Buffer | Uint8Array | string };

export type Manifest = {
  product: { id: string; name: string; revision: number };
  template: Template;
  /** Each print file with the variants (SKU, or id without one) it is printed for. */
  printFiles: { name: string; width: number; height: number; dpi: number; variants: string[]; sameDesignForAllVariants: boolean }[];
  /** Every product variant: its SKU, the print file to print, its previews and its blank. */
  variants: ManifestVariant[];
  motifs: { motifId: string; name: string; version: number; width: number; height: number; rights: { status: string; source: string; licence: string } }[];
  preflight: PreflightReport;
  /** What the renderer could not draw (e.g. text placements), so nobody is surprised at the press. */
  renderNotes: { placementId: string; code: string; message: string }[];
  softProof: { profile: string; shareOverDeltaE5: number };
  files: string[];
  createdAt: string;
};

export function manifestMotifs(versions: Iterable<MotifVersionRecord>, used: Set<string>): Manifest['motifs'] {
  return [...versions]
    .filter((v) => used.has(`${v.motifId}@${v.version}`))
    .map((v) => ({ motifId: v.motifId, name: v.name, version: v.version, width: v.width, height: v.height, rights: { status: v.rightsStatus, source: v.rightsSource, licence: v.rightsLicence } }));
}

/** Zips the entries in memory (an export's files are a few tens of MB at most; the template bounds the print file). */
export async function zipBundle(entries: BundleEntry[]): Promise<Buffer> {
  const zip = new ZipArchive({ zlib: { level: 6 } });
  const out = new PassThrough();
  const chunks: Buffer[] = [];
  out.on('data', (c: Buffer) => chunks.push(c));
  const finished = new Promise<void>((resolve, reject) => {
    out.on('end', resolve);
    zip.on('error', reject);
  });
  zip.pipe(out);
  for (const e of entries) zip.append(typeof e.data === 'string' ? e.data : Buffer.from(e.data), { name: e.name });
  await zip.finalize();
  await finished;
  return Buffer.concat(chunks);
}
