import { deflateSync } from 'node:zlib';

// Writes PSD files byte by byte from the layout in the Adobe Photoshop File Formats
// Specification (header, colour mode data, image resources, layer and mask information with
// layer records and channel image data, merged image data), so tests can build files no
// editor would write: huge declared layers, zip bombs, lying lengths.
export type RawChannel = { id: number; compression: number; data: Buffer };
export type RawLayer = {
  top: number; left: number; bottom: number; right: number;
  channels: RawChannel[];
  name?: string;
  // raw bytes of the Pascal name, when the test needs exact bytes
  nameBytes?: Buffer;
  blendKey?: string;
  opacity?: number;
  flags?: number;
  // extra 'additional layer info' blocks, already encoded
  additional?: Buffer[];
  // spec "Layer mask / adjustment layer data", the 20-byte form
  mask?: { top: number; left: number; bottom: number; right: number; defaultColor: number; flags?: number };
};
export type RawPsd = {
  width: number; height: number; channels?: number; depth?: number; mode?: number; version?: number;
  layers: RawLayer[];
  // merged image data after its 2-byte compression code (raw planar channels)
  merged?: Buffer;
};

export function writeRawPsd(psd: RawPsd): Buffer {
  const header = Buffer.alloc(26);
  header.write('8BPS', 0, 'latin1');
  header.writeUInt16BE(psd.version ?? 1, 4);
  header.writeUInt16BE(psd.channels ?? 3, 12);
  header.writeUInt32BE(psd.height, 14);
  header.writeUInt32BE(psd.width, 18);
  header.writeUInt16BE(psd.depth ?? 8, 22);
  header.writeUInt16BE(psd.mode ?? 3, 24);
  const records = psd.layers.map(layerRecord);
  const channelData = psd.layers.flatMap((layer) => layer.channels.map((c) => Buffer.concat([u16(c.compression), c.data])));
  let layerInfo = Buffer.concat([i16(psd.layers.length), ...records, ...channelData]);
  if (layerInfo.length % 2) layerInfo = Buffer.concat([layerInfo, Buffer.alloc(1)]);
  const layerAndMask = Buffer.concat([u32(layerInfo.length), layerInfo, u32(0)]);
  // merged image: raw, all zero, 3 channels
  const merged = Buffer.concat([u16(0), psd.merged ?? Buffer.alloc(psd.width * psd.height * 3 > 4096 ? 0 : psd.width * psd.height * 3)]);
  return Buffer.concat([header, u32(0), u32(0), u32(layerAndMask.length), layerAndMask, merged]);
}

function layerRecord(layer: RawLayer): Buffer {
  const rect = Buffer.concat([i32(layer.top), i32(layer.left), i32(layer.bottom), i32(layer.right)]);
  const channels = Buffer.concat([u16(layer.channels.length), ...layer.channels.map((c) => Buffer.concat([i16(c.id), u32(c.data.length + 2)]))]);
  const blend = Buffer.concat([Buffer.from('8BIM', 'latin1'), Buffer.from(layer.blendKey ?? 'norm', 'latin1'),
    Buffer.from([layer.opacity ?? 255, 0, layer.flags ?? 0, 0])]);
  const nameBytes = layer.nameBytes ?? Buffer.from(layer.name ?? 'Layer', 'latin1');
  let name = Buffer.concat([Buffer.from([nameBytes.length]), nameBytes]);
  while (name.length % 4) name = Buffer.concat([name, Buffer.alloc(1)]);
  const m = layer.mask;
  const maskData = m
    ? Buffer.concat([u32(20), i32(m.top), i32(m.left), i32(m.bottom), i32(m.right), Buffer.from([m.defaultColor, m.flags ?? 0, 0, 0])])
    : u32(0);
  const extra = Buffer.concat([maskData, u32(0), name, ...(layer.additional ?? [])]);
  return Buffer.concat([rect, channels, blend, u32(extra.length), extra]);
}

// 'luni': the layer's Unicode name (UTF-16 BE with a 4-byte length)
export function unicodeNameBlock(name: string): Buffer {
  const chars = Buffer.alloc(name.length * 2);
  for (let i = 0; i < name.length; i++) chars.writeUInt16BE(name.charCodeAt(i), i * 2);
  let body = Buffer.concat([u32(name.length), chars]);
  if (body.length % 2) body = Buffer.concat([body, Buffer.alloc(1)]);
  return Buffer.concat([Buffer.from('8BIMluni', 'latin1'), u32(body.length), body]);
}

export function rawChannel(id: number, bytes: Uint8Array): RawChannel {
  return { id, compression: 0, data: Buffer.from(bytes) };
}

export function zipChannel(id: number, bytes: Uint8Array): RawChannel {
  return { id, compression: 2, data: deflateSync(bytes) };
}

export function u16(v: number): Buffer { const b = Buffer.alloc(2); b.writeUInt16BE(v); return b; }
export function i16(v: number): Buffer { const b = Buffer.alloc(2); b.writeInt16BE(v); return b; }
export function u32(v: number): Buffer { const b = Buffer.alloc(4); b.writeUInt32BE(v); return b; }
export function i32(v: number): Buffer { const b = Buffer.alloc(4); b.writeInt32BE(v); return b; }
