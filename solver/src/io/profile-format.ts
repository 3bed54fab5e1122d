// Tissue profile files: "OVSP" magic, u32 format version, u32 header length, a UTF-8 JSON header,
// zero padding to 8 bytes, then every typed array little-endian, each 8-byte aligned. The JSON
// holds the profile with each typed array replaced by {"$a": index} and each number JSON cannot
// write (NaN, ±Infinity, −0) by {"$n": "…"}, so reading gives back exactly what was written. The
// id is the SHA-256 of the file written with an empty id.
import { SolverInputError } from '../errors.js';
import type { TissueProfile } from '../types.js';
import { sha256Hex } from './sha-256.js';

/** Format version this build writes and reads. */
export const PROFILE_FORMAT_VERSION = 1;
const MAGIC = [0x4f, 0x56, 0x53, 0x50]; // "OVSP"

const ARRAY_TYPES = {
  Float32Array,
  Float64Array,
  Uint8Array,
  Uint16Array,
  Uint32Array,
  Int32Array,
} as const;
type ArrayTypeName = keyof typeof ARRAY_TYPES;
type AnyTypedArray = InstanceType<(typeof ARRAY_TYPES)[ArrayTypeName]>;
interface ArrayEntry {
  type: ArrayTypeName;
  byteOffset: number;
  length: number;
}
const LITTLE_ENDIAN = new Uint8Array(Uint16Array.of(1).buffer)[0] === 1;

function typeName(v: unknown): ArrayTypeName | null {
  for (const name of Object.keys(ARRAY_TYPES) as ArrayTypeName[]) {
    if (v instanceof ARRAY_TYPES[name]) return name;
  }
  return null;
}

/** Bytes of a typed array in little-endian order. */
function littleEndianBytes(a: AnyTypedArray): Uint8Array {
  const bytes = new Uint8Array(a.buffer.slice(a.byteOffset, a.byteOffset + a.byteLength));
  if (!LITTLE_ENDIAN && a.BYTES_PER_ELEMENT > 1) {
    for (let o = 0; o < bytes.length; o += a.BYTES_PER_ELEMENT)
      bytes.subarray(o, o + a.BYTES_PER_ELEMENT).reverse();
  }
  return bytes;
}

/** Serialises a profile (its `id` field as given). */
function encode(profile: TissueProfile): Uint8Array {
  const arrays: AnyTypedArray[] = [];
  const json = JSON.stringify(profile, function (this: unknown, _key, value: unknown) {
    const name = typeName(value);
    if (name) {
      arrays.push(value as AnyTypedArray);
      return { $a: arrays.length - 1 };
    }
    if (typeof value === 'number' && (!Number.isFinite(value) || Object.is(value, -0))) {
      return { $n: Object.is(value, -0) ? '-0' : String(value) };
    }
    return value;
  });
  const entries: ArrayEntry[] = [];
  let offset = 0;
  for (const a of arrays) {
    entries.push({ type: typeName(a) as ArrayTypeName, byteOffset: offset, length: a.length });
    offset += Math.ceil(a.byteLength / 8) * 8;
  }
  const header = new TextEncoder().encode(
    JSON.stringify({
      formatVersion: PROFILE_FORMAT_VERSION,
      arrays: entries,
      profile: JSON.parse(json),
    }),
  );
  const headerEnd = Math.ceil((12 + header.length) / 8) * 8;
  const out = new Uint8Array(headerEnd + offset);
  out.set(MAGIC, 0);
  const view = new DataView(out.buffer);
  view.setUint32(4, PROFILE_FORMAT_VERSION, true);
  view.setUint32(8, header.length, true);
  out.set(header, 12);
  arrays.forEach((a, i) => out.set(littleEndianBytes(a), headerEnd + entries[i].byteOffset));
  return out;
}

/** Content hash of a profile: SHA-256 (hex) of its serialisation with an empty id. */
export function profileId(profile: TissueProfile): string {
  return sha256Hex(encode({ ...profile, id: '' }));
}

/** Serialises a profile; the written id is its content hash. */
export function writeProfile(profile: TissueProfile): Uint8Array {
  return encode({ ...profile, id: profileId(profile) });
}

function bad(message: string): SolverInputError {
  return new SolverInputError('NOT_A_PROFILE', message, {});
}

/** Reads a profile written by writeProfile; typed errors for other files and other versions. */
export function readProfile(bytes: Uint8Array): TissueProfile {
  if (bytes.length < 12 || MAGIC.some((m, i) => bytes[i] !== m))
    throw bad('not a tissue profile file (no OVSP header)');
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const version = view.getUint32(4, true);
  if (version !== PROFILE_FORMAT_VERSION) {
    throw new SolverInputError(
      'UNSUPPORTED_FORMAT_VERSION',
      `profile format version ${version}; this solver reads version ${PROFILE_FORMAT_VERSION}`,
      { item: 'formatVersion' },
    );
  }
  const headerLength = view.getUint32(8, true);
  const headerEnd = Math.ceil((12 + headerLength) / 8) * 8;
  if (12 + headerLength > bytes.length) throw bad('the profile header is truncated');
  let header: { arrays: ArrayEntry[]; profile: unknown };
  try {
    header = JSON.parse(new TextDecoder().decode(bytes.subarray(12, 12 + headerLength)));
  } catch {
    throw bad('the profile header is not valid JSON');
  }
  const arrays = (header.arrays ?? []).map((e, i) => {
    const Ctor = ARRAY_TYPES[e.type];
    const start = headerEnd + e.byteOffset;
    const byteLength = Ctor ? e.length * Ctor.BYTES_PER_ELEMENT : -1;
    if (!Ctor || !(byteLength >= 0) || start + byteLength > bytes.length) {
      throw bad(`profile array ${i} (${String(e.type)}) is truncated or of unknown type`);
    }
    const copy = bytes.slice(start, start + byteLength);
    if (!LITTLE_ENDIAN && Ctor.BYTES_PER_ELEMENT > 1) {
      for (let o = 0; o < copy.length; o += Ctor.BYTES_PER_ELEMENT)
        copy.subarray(o, o + Ctor.BYTES_PER_ELEMENT).reverse();
    }
    return new Ctor(copy.buffer, 0, e.length);
  });
  const profile = JSON.parse(JSON.stringify(header.profile), (_key, value: unknown) => {
    if (value && typeof value === 'object' && !Array.isArray(value)) {
      const v = value as { $a?: number; $n?: string };
      if (typeof v.$a === 'number' && Object.keys(v).length === 1) {
        if (!arrays[v.$a]) throw bad(`profile refers to a missing array ${v.$a}`);
        return arrays[v.$a];
      }
      if (typeof v.$n === 'string' && Object.keys(v).length === 1)
        return v.$n === '-0' ? -0 : Number(v.$n);
    }
    return value;
  }) as TissueProfile;
  if (profile.formatVersion !== PROFILE_FORMAT_VERSION || typeof profile.id !== 'string') {
    throw bad('the profile header lacks its format version or id');
  }
  if (profileId(profile) !== profile.id)
    throw bad('the profile content does not match its id (the file is corrupted)');
  return profile;
}
