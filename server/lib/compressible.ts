import compression from 'compression';
import type { Request, Response } from 'express';

// Text answers (JSON, HTML, scripts, styles, SVG, CSV) are compressed on the way out. Images,
// PSDs, PDFs and archives are not: they are compressed in their own format already, or large
// enough that squeezing them again on every download costs more than it saves.
const alreadyPacked = /^(image\/(?!svg\+xml)|application\/(pdf|zip|octet-stream)|font\/)/;

export function compressible(req: Request, res: Response): boolean {
  const type = String(res.getHeader('Content-Type') ?? '');
  if (alreadyPacked.test(type)) return false;
  return compression.filter(req, res);
}
