// Labels a .glb as invented sample data: `extras.overshoot` at the document root says so, with
// the generator, seed and what the file holds. glTF-Transform re-serialises the file otherwise
// unchanged (same writer the solver uses, so the output stays deterministic).
import { WebIO, type Document } from '@gltf-transform/core';

const io = new WebIO();

/** What every generated file says about itself. */
export interface SampleLabel {
  /** Always true: nothing here is a scan or capture of a real person. */
  invented: true;
  /** Human sentence saying so. */
  notice: string;
  generator: string;
  seed: number;
  /** What the file holds: character, clip or capture. */
  kind: 'character' | 'clip' | 'capture';
  /** Anything else worth knowing (title, fps, ground-truth file, …). */
  [key: string]: unknown;
}

/** Sentence stored in every generated file. */
export const INVENTED_NOTICE =
  'Invented sample data for the Overshoot demo and tests: procedural, not a scan or capture of any real person.';

/** Returns `bytes` with `extras.overshoot = label` on the glTF root, after an optional edit. */
export async function stampGlb(
  bytes: Uint8Array,
  label: SampleLabel,
  edit?: (doc: Document) => void,
): Promise<Uint8Array> {
  const doc = await io.readBinary(bytes);
  edit?.(doc);
  const root = doc.getRoot();
  root.setExtras({ ...root.getExtras(), overshoot: label });
  return io.writeBinary(doc);
}
