// Test helper: take a .glb apart into JSON and binary chunk and put it back together, to craft
// invalid files that no writer would produce.

/** Parsed GLB: JSON object and binary chunk (a copy, safe to edit). */
export interface GlbParts {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  json: any;
  bin: Uint8Array;
}

/** Splits GLB bytes into parts. */
export function splitGlb(bytes: Uint8Array): GlbParts {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const jsonLength = view.getUint32(12, true);
  const json = JSON.parse(new TextDecoder().decode(bytes.subarray(20, 20 + jsonLength)));
  const binStart = 20 + jsonLength;
  const bin =
    binStart + 8 <= bytes.byteLength
      ? bytes.slice(binStart + 8, binStart + 8 + view.getUint32(binStart, true))
      : new Uint8Array(0);
  return { json, bin };
}

/** Joins parts into GLB bytes (chunks padded to 4 bytes). */
export function joinGlb({ json, bin }: GlbParts): Uint8Array {
  let text: Uint8Array = new TextEncoder().encode(JSON.stringify(json));
  const jsonPad = (4 - (text.length % 4)) % 4;
  text = concat(text, new Uint8Array(jsonPad).fill(0x20));
  const binPad = (4 - (bin.length % 4)) % 4;
  const binChunk = concat(bin, new Uint8Array(binPad));
  const total = 12 + 8 + text.length + (bin.length ? 8 + binChunk.length : 0);
  const out = new Uint8Array(total);
  const view = new DataView(out.buffer);
  view.setUint32(0, 0x46546c67, true);
  view.setUint32(4, 2, true);
  view.setUint32(8, total, true);
  view.setUint32(12, text.length, true);
  view.setUint32(16, 0x4e4f534a, true);
  out.set(text, 20);
  if (bin.length) {
    const o = 20 + text.length;
    view.setUint32(o, binChunk.length, true);
    view.setUint32(o + 4, 0x004e4942, true);
    out.set(binChunk, o + 8);
  }
  return out;
}

/** Byte offset in the BIN chunk of element `index` of accessor `accessor`. */
export function elementOffset(
  parts: GlbParts,
  accessor: number,
  index: number,
  elementBytes: number,
): number {
  const acc = parts.json.accessors[accessor];
  const view = parts.json.bufferViews[acc.bufferView];
  const stride = view.byteStride ?? elementBytes;
  return (view.byteOffset ?? 0) + (acc.byteOffset ?? 0) + index * stride;
}

/** Applies `edit` to the parts of `bytes` and returns the rebuilt file. */
export function patchGlb(bytes: Uint8Array, edit: (parts: GlbParts) => void): Uint8Array {
  const parts = splitGlb(bytes);
  edit(parts);
  return joinGlb(parts);
}

function concat(a: Uint8Array, b: Uint8Array): Uint8Array {
  const out = new Uint8Array(a.length + b.length);
  out.set(a);
  out.set(b, a.length);
  return out;
}
