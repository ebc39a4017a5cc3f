import type { ScannedLayerRecord } from './scan-layer-records';

const MAX_NAME_LENGTH = 200;
const utf8 = new TextDecoder('utf-8', { fatal: true });

// The Pascal-string name is the only name some writers store, in raw UTF-8; a reader that takes
// it as one byte per character turns "Forêt" into "ForÃªt". When there is no Unicode name
// ('luni'), decode the stored bytes as UTF-8 when they are valid UTF-8, else as Latin-1.
export function layerNameFromFile(parsedName: string | undefined, record: ScannedLayerRecord | undefined): string {
  if (record && !record.hasUnicodeName) {
    try {
      return utf8.decode(record.nameBytes);
    } catch {
      return record.nameBytes.toString('latin1');
    }
  }
  return parsedName ?? '';
}

// Names come from uploaded files and are shown as text only: control and bidirectional-override
// characters become spaces (they can hide or reorder what a reviewer sees); markup stays literal.
export function cleanName(raw: string, fallback: string): string {
  const cleaned = raw
    .replace(/\p{Cs}/gu, '\uFFFD')
    .replace(/[\p{Cc}\u2028\u2029\u202a-\u202e\u2066-\u2069\u200e\u200f\u061c]/gu, ' ')
    .replace(/\s+/gu, ' ')
    .trim();
  const limited = Array.from(cleaned).slice(0, MAX_NAME_LENGTH).join('');
  return limited === '' ? fallback : limited;
}

// 'Group/Layer'; '\' and '/' inside a name are escaped as '\\' and '\/' so paths split back.
export function sourcePathOf(names: readonly string[]): string {
  return names.map((name) => name.replace(/\\/g, '\\\\').replace(/\//g, '\\/')).join('/');
}

export function splitSourcePath(path: string): string[] {
  const names: string[] = [];
  let current = '';
  for (let i = 0; i < path.length; i++) {
    const char = path[i];
    if (char === '\\' && i + 1 < path.length) {
      current += path[++i];
    } else if (char === '/') {
      names.push(current);
      current = '';
    } else {
      current += char;
    }
  }
  names.push(current);
  return names;
}
