import { z } from 'zod';
import type { PlaceableMotif } from '../place-motifs';

// Our own drag type, so text or files dragged from elsewhere are not mistaken for motifs.
export const MOTIF_DRAG_TYPE = 'application/x-motifold-motif';

const placeableSchema = z.object({ id: z.string().min(1).max(64), version: z.number().int().positive(), width: z.number().int().positive(), height: z.number().int().positive() });

export function writeMotifDrag(data: DataTransfer, motif: PlaceableMotif): void {
  data.setData(MOTIF_DRAG_TYPE, JSON.stringify({ id: motif.id, version: motif.version, width: motif.width, height: motif.height }));
  data.effectAllowed = 'copy';
}

export function readMotifDrag(data: DataTransfer): PlaceableMotif | null {
  try {
    const parsed = placeableSchema.safeParse(JSON.parse(data.getData(MOTIF_DRAG_TYPE)));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}
