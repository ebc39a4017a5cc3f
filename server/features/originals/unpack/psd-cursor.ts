import { UnpackError } from './unpack-error';

// Big-endian reads that never step outside [start, end): a PSD's lengths are untrusted.
export class PsdCursor {
  offset: number;

  constructor(readonly buffer: Buffer, offset = 0, readonly end = buffer.length) {
    this.offset = offset;
  }

  get left(): number {
    return this.end - this.offset;
  }

  need(bytes: number, what: string): void {
    if (bytes < 0 || this.offset + bytes > this.end) {
      throw new UnpackError('psd.truncated', `The PSD file ends inside ${what}; it is truncated or damaged`);
    }
  }

  u8(what: string): number {
    this.need(1, what);
    return this.buffer[this.offset++];
  }

  u16(what: string): number {
    this.need(2, what);
    const value = this.buffer.readUInt16BE(this.offset);
    this.offset += 2;
    return value;
  }

  i16(what: string): number {
    this.need(2, what);
    const value = this.buffer.readInt16BE(this.offset);
    this.offset += 2;
    return value;
  }

  u32(what: string): number {
    this.need(4, what);
    const value = this.buffer.readUInt32BE(this.offset);
    this.offset += 4;
    return value;
  }

  i32(what: string): number {
    this.need(4, what);
    const value = this.buffer.readInt32BE(this.offset);
    this.offset += 4;
    return value;
  }

  // PSB stores some lengths in 8 bytes; anything past 2^53 cannot fit a file we read anyway
  u64(what: string): number {
    const high = this.u32(what);
    const low = this.u32(what);
    if (high > 0x1fffff) throw new UnpackError('psd.corrupt', `The PSD file declares an impossible size in ${what}`);
    return high * 0x1_0000_0000 + low;
  }

  length(large: boolean, what: string): number {
    return large ? this.u64(what) : this.u32(what);
  }

  ascii(bytes: number, what: string): string {
    this.need(bytes, what);
    const text = this.buffer.toString('latin1', this.offset, this.offset + bytes);
    this.offset += bytes;
    return text;
  }

  bytes(count: number, what: string): Buffer {
    this.need(count, what);
    const view = this.buffer.subarray(this.offset, this.offset + count);
    this.offset += count;
    return view;
  }

  skip(count: number, what: string): void {
    this.need(count, what);
    this.offset += count;
  }

  // a section that declares more bytes than the file (or its parent section) holds
  section(length: number, what: string): PsdCursor {
    this.need(length, what);
    const section = new PsdCursor(this.buffer, this.offset, this.offset + length);
    this.offset += length;
    return section;
  }
}
