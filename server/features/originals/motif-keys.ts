// Object keys are derived from the content hash, so a retried import overwrites its own
// objects instead of leaving orphans, and identical pixels are stored once per studio.
export const originalFileKey = (studioId: string, originalId: string) => `studios/${studioId}/originals/${originalId}/file`;
export const motifPngKey = (studioId: string, contentHash: string) => `studios/${studioId}/motifs/${contentHash}.png`;
export const motifThumbKey = (studioId: string, contentHash: string) => `studios/${studioId}/motifs/${contentHash}.thumb.webp`;
