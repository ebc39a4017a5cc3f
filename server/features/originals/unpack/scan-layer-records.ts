import { PSD_HEADER_BYTES } from './psd-header';
import { PsdCursor } from './psd-cursor';
import { UnpackError } from './unpack-error';

// A first pass over the "Layer and Mask Information Section" of the Adobe Photoshop File
// Formats Specification, before any pixel is decoded: it gives every layer's rectangle and the
// position and declared size of each channel's compressed data, so sizes can be checked against
// the budget and the file length without allocating anything.

export type ScannedRect = { top: number; left: number; bottom: number; right: number };

export type ScannedChannel = {
  // 0, 1, 2 colour; -1 transparency; -2 layer mask; -3 real user mask (spec "Channel information")
  id: number;
  // 0 raw, 1 RLE (PackBits), 2 zip, 3 zip with prediction (spec "Channel image data")
  compression: number;
  dataOffset: number;
  dataLength: number;
};

export type ScannedMask = ScannedRect & { defaultColor: number; disabled: boolean };

export type ScannedLayerRecord = ScannedRect & {
  index: number;
  channels: ScannedChannel[];
  mask?: ScannedMask;
  // the Pascal-string name exactly as stored, to repair names written as raw UTF-8
  nameBytes: Buffer;
  hasUnicodeName: boolean;
  // 'lsct'/'lsdk' section divider type: 0 layer, 1 open group, 2 closed group, 3 group end
  sectionType: number;
};

export type LayerScan = {
  large: boolean;
  records: ScannedLayerRecord[];
  // spec: a negative layer count means the first alpha channel is the merged transparency
  globalAlpha: boolean;
  compositeOffset: number;
};

// Spec, "Additional Layer Information": keys whose length is 8 bytes in PSB files.
const LARGE_KEYS = new Set(['LMsk', 'Lr16', 'Lr32', 'Layr', 'Mt16', 'Mt32', 'Mtrn', 'Alph', 'FMsk', 'lnk2', 'FEid', 'FXid', 'PxSD', 'cinf']);
// Some writers misalign additional-info blocks by a few bytes; readers realign on the signature.
const REALIGN_OFFSETS = [0, 1, -1, 2, -2, 3, -3, 4, -4];

export function scanLayerRecords(file: Buffer, version: 1 | 2): LayerScan {
  const large = version === 2;
  const cursor = new PsdCursor(file, PSD_HEADER_BYTES);
  cursor.skip(cursor.u32('the colour mode data length'), 'the colour mode data');
  cursor.skip(cursor.u32('the image resources length'), 'the image resources');
  const layerAndMaskLength = cursor.length(large, 'the layer and mask section length');
  const layerAndMask = cursor.section(layerAndMaskLength, 'the layer and mask section');
  const compositeOffset = cursor.offset;
  if (layerAndMask.left === 0) return { large, records: [], globalAlpha: false, compositeOffset };

  const layerInfoLength = layerAndMask.length(large, 'the layer info length');
  if (layerInfoLength === 0) return { large, records: [], globalAlpha: false, compositeOffset };
  const layerInfo = layerAndMask.section(layerInfoLength, 'the layer info');
  const declaredCount = layerInfo.i16('the layer count');
  const records: ScannedLayerRecord[] = [];
  const count = Math.abs(declaredCount);
  for (let index = 0; index < count; index++) records.push(readLayerRecord(layerInfo, index, large));
  locateChannelData(layerInfo, records);
  return { large, records, globalAlpha: declaredCount < 0, compositeOffset };
}

function readLayerRecord(cursor: PsdCursor, index: number, large: boolean): ScannedLayerRecord {
  const what = `layer record ${index + 1}`;
  const rect = readRect(cursor, what);
  const channelCount = cursor.u16(what);
  if (channelCount > 56) throw new UnpackError('psd.corrupt', `Layer ${index + 1} declares ${channelCount} channels; the file is damaged`);
  const declared: { id: number; length: number }[] = [];
  for (let i = 0; i < channelCount; i++) declared.push({ id: cursor.i16(what), length: cursor.length(large, what) });
  if (cursor.ascii(4, what) !== '8BIM') throw new UnpackError('psd.corrupt', `Layer ${index + 1} has no blend mode signature; the file is damaged`);
  cursor.skip(4 + 4, what); // blend key, opacity, clipping, flags, filler (ag-psd reads them again)
  const extra = cursor.section(cursor.u32(what), `the extra data of ${what}`);
  const mask = readMask(extra, what);
  extra.skip(extra.u32(what), `the blending ranges of ${what}`);
  const nameLength = extra.u8(what);
  const nameBytes = extra.bytes(nameLength, `the name of ${what}`);
  const info = readAdditionalInfo(extra, large);
  return {
    ...rect,
    index,
    // compression and data offsets are filled in once the records end
    channels: declared.map(({ id, length }) => ({ id, compression: -1, dataOffset: 0, dataLength: length })),
    mask,
    nameBytes,
    hasUnicodeName: info.hasUnicodeName,
    sectionType: info.sectionType,
  };
}

function readRect(cursor: PsdCursor, what: string): ScannedRect {
  const top = cursor.i32(what);
  const left = cursor.i32(what);
  const bottom = cursor.i32(what);
  const right = cursor.i32(what);
  if (bottom < top || right < left) throw new UnpackError('psd.corrupt', `The rectangle of ${what} is inverted; the file is damaged`);
  return { top, left, bottom, right };
}

function readMask(extra: PsdCursor, what: string): ScannedMask | undefined {
  const length = extra.u32(`the mask of ${what}`);
  if (length === 0) return undefined;
  const mask = extra.section(length, `the mask of ${what}`);
  if (length < 18) return undefined;
  const rect = readRect(mask, `the mask of ${what}`);
  const defaultColor = mask.u8(what);
  const flags = mask.u8(what);
  // spec "Layer mask / adjustment layer data": flags bit 1 = mask disabled
  return { ...rect, defaultColor, disabled: (flags & 2) !== 0 };
}

function readAdditionalInfo(extra: PsdCursor, large: boolean): { hasUnicodeName: boolean; sectionType: number } {
  let hasUnicodeName = false;
  let sectionType = 0;
  // the name is padded to 4 bytes, but not always: find the first signature like readers do
  while (extra.left > 4 && !signatureAt(extra)) extra.offset++;
  while (extra.left >= 12) {
    if (!realign(extra)) break;
    const signature = extra.ascii(4, 'additional layer info');
    const key = extra.ascii(4, 'additional layer info');
    const eightBytes = large && (signature === '8B64' || LARGE_KEYS.has(key));
    const length = extra.length(eightBytes, 'additional layer info');
    const block = extra.section(Math.min(length, extra.left), 'additional layer info');
    if (key === 'luni' && block.left > 4) hasUnicodeName = block.u32('a unicode name') > 0;
    if ((key === 'lsct' || key === 'lsdk') && block.left >= 4) sectionType = block.u32('a section divider');
    // spec: "Length data below, rounded up to an even byte count"
    if (length % 2 === 1 && extra.left > 0) extra.offset++;
  }
  return { hasUnicodeName, sectionType };
}

function signatureAt(cursor: PsdCursor): boolean {
  if (cursor.left < 4) return false;
  const signature = cursor.buffer.toString('latin1', cursor.offset, cursor.offset + 4);
  return signature === '8BIM' || signature === '8B64';
}

function realign(cursor: PsdCursor): boolean {
  const start = cursor.offset;
  for (const shift of REALIGN_OFFSETS) {
    cursor.offset = start + shift;
    if (cursor.offset >= 0 && signatureAt(cursor)) return true;
  }
  cursor.offset = start;
  return false;
}

// Spec, "Channel image data": after the records, each layer's channels in record order, each
// a 2-byte compression code followed by (declared length - 2) bytes.
function locateChannelData(cursor: PsdCursor, records: ScannedLayerRecord[]): void {
  for (const record of records) {
    for (const channel of record.channels) {
      const declared = channel.dataLength;
      if (declared === 0) {
        channel.compression = 0;
        channel.dataLength = 0;
        continue;
      }
      if (declared > cursor.left) {
        throw new UnpackError('psd.truncated',
          `Layer ${record.index + 1} declares more pixel data than the file holds; the file is truncated or damaged`);
      }
      const start = cursor.offset;
      channel.compression = declared >= 2 ? cursor.u16('channel data') : 0;
      if (channel.compression > 3) throw new UnpackError('psd.corrupt', `Layer ${record.index + 1} uses an unknown compression (${channel.compression})`);
      channel.dataOffset = cursor.offset;
      channel.dataLength = Math.max(0, declared - 2);
      cursor.offset = start + declared;
    }
  }
}
