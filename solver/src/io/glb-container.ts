// GLB container checks and document loading. The header is checked by hand first so that a
// wrong or cut-short file gets a precise error instead of a parser failure deep inside.
import { WebIO, type Document } from '@gltf-transform/core';
import { SolverInputError } from '../errors.js';

const GLB_MAGIC = 0x46546c67; // 'glTF'
const CHUNK_JSON = 0x4e4f534a;

/** True when the bytes start with the GLB magic. */
export function isGlb(bytes: Uint8Array): boolean {
  if (bytes.byteLength < 4) return false;
  return new DataView(bytes.buffer, bytes.byteOffset, 4).getUint32(0, true) === GLB_MAGIC;
}

/** Validates the GLB header and chunk table: NOT_GLTF or TRUNCATED_FILE on failure. */
export function checkGlbContainer(bytes: Uint8Array): void {
  if (!isGlb(bytes)) {
    const head = new TextDecoder().decode(bytes.subarray(0, 64)).trimStart();
    const hint = head.startsWith('{')
      ? ' (this looks like a JSON .gltf; export a binary .glb)'
      : '';
    throw new SolverInputError('NOT_GLTF', `not a binary glTF (.glb) file${hint}`, {
      item: 'header',
    });
  }
  if (bytes.byteLength < 20) {
    throw new SolverInputError('TRUNCATED_FILE', 'file ends inside the GLB header', {
      item: 'header',
    });
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const version = view.getUint32(4, true);
  if (version !== 2) {
    throw new SolverInputError('NOT_GLTF', `GLB version ${version} is not glTF 2.0`, {
      item: 'header',
    });
  }
  const declared = view.getUint32(8, true);
  if (declared > bytes.byteLength) {
    throw new SolverInputError(
      'TRUNCATED_FILE',
      `file declares ${declared} bytes but holds only ${bytes.byteLength}`,
      { item: 'header' },
    );
  }
  let offset = 12;
  let chunk = 0;
  while (offset < declared) {
    if (offset + 8 > declared) {
      throw new SolverInputError('TRUNCATED_FILE', 'file ends inside a chunk header', {
        item: `chunk ${chunk}`,
      });
    }
    const length = view.getUint32(offset, true);
    const type = view.getUint32(offset + 4, true);
    if (chunk === 0 && type !== CHUNK_JSON) {
      throw new SolverInputError('NOT_GLTF', 'the first GLB chunk is not JSON', {
        item: 'chunk 0',
      });
    }
    if (offset + 8 + length > declared) {
      throw new SolverInputError(
        'TRUNCATED_FILE',
        `chunk ${chunk} needs ${length} bytes but the file ends first`,
        { item: `chunk ${chunk}` },
      );
    }
    offset += 8 + length;
    chunk++;
  }
}

const io = new WebIO();

/** Checks the container and parses it with glTF-Transform; parser failures become NOT_GLTF. */
export async function openGlb(bytes: Uint8Array): Promise<Document> {
  checkGlbContainer(bytes);
  try {
    return await io.readBinary(bytes);
  } catch (e) {
    const reason = e instanceof Error ? e.message : String(e);
    throw new SolverInputError('NOT_GLTF', `the glTF content could not be parsed: ${reason}`, {
      item: 'json',
    });
  }
}

/** Serialises a document to GLB bytes. */
export async function writeGlb(doc: Document): Promise<Uint8Array> {
  return io.writeBinary(doc);
}
