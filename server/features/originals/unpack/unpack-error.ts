// Every way an unpack can fail, as a code the error middleware maps to an HTTP status and a
// message the user can act on.
export type UnpackErrorCode =
  | 'upload.unsupported_type'
  | 'upload.too_large'
  | 'upload.unreadable'
  | 'psd.truncated'
  | 'psd.bad_signature'
  | 'psd.bad_version'
  | 'psd.psb_unsupported'
  | 'psd.bad_channels'
  | 'psd.bad_dimensions'
  | 'psd.bad_depth'
  | 'psd.unsupported_depth'
  | 'psd.bad_mode'
  | 'psd.unsupported_mode'
  | 'psd.too_many_layers'
  | 'psd.document_too_large'
  | 'psd.layer_too_large'
  | 'psd.layers_too_large'
  | 'psd.corrupt'
  | 'psd.timeout'
  | 'psd.out_of_memory'
  | 'image.corrupt'
  | 'image.too_large'
  | 'svg.too_large'
  | 'svg.unsafe'
  | 'svg.unreadable'
  | 'unpack.crashed';

export type UnpackErrorValue = { code: UnpackErrorCode; message: string };

export class UnpackError extends Error {
  readonly code: UnpackErrorCode;

  constructor(code: UnpackErrorCode, message: string) {
    super(message);
    this.name = 'UnpackError';
    this.code = code;
  }

  toValue(): UnpackErrorValue {
    return { code: this.code, message: this.message };
  }
}

export function isUnpackError(value: unknown): value is UnpackError {
  return value instanceof UnpackError;
}

export const unpackErrorCodes: readonly UnpackErrorCode[] = [
  'upload.unsupported_type', 'upload.too_large', 'upload.unreadable',
  'psd.truncated', 'psd.bad_signature', 'psd.bad_version', 'psd.psb_unsupported',
  'psd.bad_channels', 'psd.bad_dimensions', 'psd.bad_depth', 'psd.unsupported_depth',
  'psd.bad_mode', 'psd.unsupported_mode', 'psd.too_many_layers', 'psd.document_too_large',
  'psd.layer_too_large', 'psd.layers_too_large', 'psd.corrupt', 'psd.timeout',
  'psd.out_of_memory', 'image.corrupt', 'image.too_large', 'svg.too_large', 'svg.unsafe', 'svg.unreadable',
  'unpack.crashed',
];

export function isUnpackErrorCode(value: string): value is UnpackErrorCode {
  return (unpackErrorCodes as readonly string[]).includes(value);
}
