// Which files the originals upload takes, checked in the browser before any byte is sent. The
// server decides from the file's own bytes; this check only spares people a long upload that
// would be refused.

// The server's default limit (UPLOAD_LIMIT_BYTES, 1 GiB). A studio configured lower still gets
// the server's 413 message, shown as it is.
export const UPLOAD_LIMIT_BYTES = 1024 ** 3;

export type OriginalFileKind = 'psd' | 'png' | 'jpeg' | 'webp' | 'svg';

// Large-document PSB files unpack like PSD ones, within the same pixel limits.
const kindsByExtension: Record<string, OriginalFileKind> = {
  psd: 'psd',
  psb: 'psd',
  png: 'png',
  jpg: 'jpeg',
  jpeg: 'jpeg',
  webp: 'webp',
  svg: 'svg',
};

const kindsByMime: Record<string, OriginalFileKind> = {
  'image/vnd.adobe.photoshop': 'psd',
  'application/x-photoshop': 'psd',
  'application/photoshop': 'psd',
  'image/psd': 'psd',
  'image/png': 'png',
  'image/jpeg': 'jpeg',
  'image/webp': 'webp',
  'image/svg+xml': 'svg',
};

// For the file picker; listing MIME types as well helps pickers that ignore extensions.
export const originalFileAccept = '.psd,.psb,.png,.jpg,.jpeg,.webp,.svg,image/png,image/jpeg,image/webp,image/svg+xml,image/vnd.adobe.photoshop';

export type FileProblem = { code: 'upload.unsupported_type' | 'upload.too_large' | 'upload.empty'; message: string };

type FileFacts = { name: string; size: number; type: string };

const extensionOf = (name: string) => {
  const dot = name.lastIndexOf('.');
  return dot > 0 ? name.slice(dot + 1).toLowerCase() : '';
};

export function fileKindOf(file: Pick<FileFacts, 'name' | 'type'>): OriginalFileKind | null {
  return kindsByExtension[extensionOf(file.name)] ?? kindsByMime[file.type.toLowerCase()] ?? null;
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  const units = ['KB', 'MB', 'GB', 'TB'];
  let value = bytes / 1024;
  let unit = 0;
  while (value >= 1024 && unit < units.length - 1) {
    value /= 1024;
    unit += 1;
  }
  return `${value >= 100 ? Math.round(value) : value.toFixed(1)} ${units[unit]}`;
}

export function checkOriginalFile(file: FileFacts, limitBytes = UPLOAD_LIMIT_BYTES): FileProblem | null {
  const extension = extensionOf(file.name);
  if (!fileKindOf(file)) {
    const what = extension ? `a .${extension} file` : 'a file without a type';
    return {
      code: 'upload.unsupported_type',
      message: `“${file.name}” is ${what}. Originals can be layered PSD (or PSB) files, flat PNG, JPEG or WebP images, or SVG drawings.`,
    };
  }
  if (file.size === 0) return { code: 'upload.empty', message: `“${file.name}” is empty (0 bytes).` };
  if (file.size > limitBytes) {
    return {
      code: 'upload.too_large',
      message: `“${file.name}” is ${formatBytes(file.size)}, larger than the upload limit of ${formatBytes(limitBytes)}.`,
    };
  }
  return null;
}
