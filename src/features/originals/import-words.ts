import type { OriginalSummary } from '@shared/contracts/originals';
import type { BadgeTone } from '../../components/ui/badge';

export const statusWords: Record<OriginalSummary['status'], { label: string; tone: BadgeTone }> = {
  queued: { label: 'Waiting', tone: 'neutral' },
  importing: { label: 'Importing', tone: 'tide' },
  ready: { label: 'Ready', tone: 'kelp' },
  failed: { label: 'Failed', tone: 'rust' },
};

export const phaseWords: Record<OriginalSummary['phase'], string> = {
  queued: 'Waiting for its turn',
  reading: 'Reading the layers',
  cutting: 'Cutting motifs',
  encoding: 'Making images and thumbnails',
  storing: 'Saving images',
  finishing: 'Adding motifs to the library',
  done: 'Done',
};

export const cutWords: Record<OriginalSummary['cut'], { label: string; hint: string }> = {
  groups: {
    label: 'One motif per layer group',
    hint: 'Each top-level group is flattened into one motif; loose layers become motifs of their own.',
  },
  layers: { label: 'One motif per layer', hint: 'Every layer becomes its own motif, also those inside groups.' },
};

export const fileKindWords: Record<OriginalSummary['fileKind'], string> = {
  psd: 'Layered PSD',
  png: 'PNG image',
  jpeg: 'JPEG image',
  webp: 'WebP image',
  svg: 'SVG drawing',
};
