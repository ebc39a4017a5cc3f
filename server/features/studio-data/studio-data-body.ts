import express from 'express';

export const STUDIO_DATA_IMPORT_PATH = '/api/studio/data-import';
// 50 MiB: a studio's metadata with some 200,000 sales rows; the objects travel separately.
export const STUDIO_DATA_IMPORT_LIMIT_BYTES = 50 * 1024 * 1024;

// Mounted before the app's own JSON parser, which then sees the body as read and lets it be.
export const studioDataBodyParser = express.json({ limit: STUDIO_DATA_IMPORT_LIMIT_BYTES });
