// Typed arrays packed as little-endian base64 text, for numeric data kept in glTF `extras`
// (JSON). Browser-safe: no Node Buffer; byte order fixed by DataView, not by the platform.

const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/';
const LOOKUP = new Int16Array(128).fill(-1);
for (let i = 0; i < ALPHABET.length; i++) LOOKUP[ALPHABET.charCodeAt(i)] = i;

/** Element types that can be packed. */
export type PackedType = 'f32' | 'f64' | 'i32';

/** A packed typed array: type, element count and base64 little-endian bytes. */
export interface PackedArray {
  type: PackedType;
  length: number;
  base64: string;
}

const SIZE: Record<PackedType, number> = { f32: 4, f64: 8, i32: 4 };

/** Packs a typed array. */
export function packArray(type: PackedType, values: ArrayLike<number>): PackedArray {
  const size = SIZE[type];
  const bytes = new Uint8Array(values.length * size);
  const view = new DataView(bytes.buffer);
  for (let i = 0; i < values.length; i++) {
    if (type === 'f32') view.setFloat32(i * size, values[i], true);
    else if (type === 'f64') view.setFloat64(i * size, values[i], true);
    else view.setInt32(i * size, values[i], true);
  }
  return { type, length: values.length, base64: encodeBase64(bytes) };
}

/** Unpacks into a new typed array; throws a RangeError when the text does not fit the length. */
export function unpackArray(packed: PackedArray): Float32Array | Float64Array | Int32Array {
  const size = SIZE[packed.type];
  if (!size) throw new RangeError(`unknown packed type ${String(packed.type)}`);
  const bytes = decodeBase64(packed.base64);
  if (bytes.length !== packed.length * size) {
    throw new RangeError(
      `packed array holds ${bytes.length} bytes, expected ${packed.length * size}`,
    );
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const out =
    packed.type === 'f32'
      ? new Float32Array(packed.length)
      : packed.type === 'f64'
        ? new Float64Array(packed.length)
        : new Int32Array(packed.length);
  for (let i = 0; i < packed.length; i++) {
    out[i] =
      packed.type === 'f32'
        ? view.getFloat32(i * size, true)
        : packed.type === 'f64'
          ? view.getFloat64(i * size, true)
          : view.getInt32(i * size, true);
  }
  return out;
}

/** Standard base64 (RFC 4648) with padding. */
export function encodeBase64(bytes: Uint8Array): string {
  const parts: string[] = [];
  let chunk = '';
  for (let i = 0; i < bytes.length; i += 3) {
    const a = bytes[i];
    const b = i + 1 < bytes.length ? bytes[i + 1] : 0;
    const c = i + 2 < bytes.length ? bytes[i + 2] : 0;
    const n = (a << 16) | (b << 8) | c;
    chunk +=
      ALPHABET[(n >> 18) & 63] +
      ALPHABET[(n >> 12) & 63] +
      (i + 1 < bytes.length ? ALPHABET[(n >> 6) & 63] : '=') +
      (i + 2 < bytes.length ? ALPHABET[n & 63] : '=');
    if (chunk.length >= 8192) {
      parts.push(chunk);
      chunk = '';
    }
  }
  parts.push(chunk);
  return parts.join('');
}

/** Decodes standard base64; throws a RangeError on characters outside the alphabet. */
export function decodeBase64(text: string): Uint8Array {
  const clean = text.replace(/=+$/, '');
  const out = new Uint8Array(Math.floor((clean.length * 3) / 4));
  let bits = 0;
  let value = 0;
  let o = 0;
  for (let i = 0; i < clean.length; i++) {
    const code = clean.charCodeAt(i);
    const v = code < 128 ? LOOKUP[code] : -1;
    if (v < 0) throw new RangeError(`not base64 at character ${i}`);
    value = (value << 6) | v;
    bits += 6;
    if (bits >= 8) {
      bits -= 8;
      out[o++] = (value >> bits) & 255;
    }
  }
  return out.subarray(0, o);
}
