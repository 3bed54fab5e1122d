// files/manifest.json: what was generated from which inputs. The inputs hash covers the generator's
// sources, the seed and the versions of the libraries that shape the bytes; when it matches and
// every listed file is intact, generation is skipped. The solver is left out on purpose: it changes
// often without changing these bytes, and the test "reproduces the files on disk exactly" catches
// a solver change that does (then run `npm run generate -w assets-sample -- --force`).
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join, relative } from 'node:path';
import type { AssetIndex } from './asset-index.js';

/** A file listed in the manifest. */
export interface ManifestFile {
  path: string;
  bytes: number;
  sha256: string;
}

/** Contents of files/manifest.json. */
export interface Manifest extends AssetIndex {
  invented: true;
  notice: string;
  generator: string;
  seed: number;
  inputsHash: string;
  totalBytes: number;
  files: ManifestFile[];
}

/** SHA-256 of bytes as hex. */
export function sha256(bytes: Uint8Array | string): string {
  return createHash('sha256').update(bytes).digest('hex');
}

function listFiles(dir: string, keep: (name: string) => boolean): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) out.push(...listFiles(path, keep));
    else if (keep(entry.name)) out.push(path);
  }
  return out.sort();
}

/** Hash of everything the output depends on. */
export function inputsHash(generatorDir: string, seed: number): string {
  const hash = createHash('sha256');
  hash.update(`seed ${seed}\n`);
  for (const file of listFiles(generatorDir, (n) => n.endsWith('.ts'))) {
    hash.update(`${relative(generatorDir, file)}\n`).update(readFileSync(file));
  }
  const require = createRequire(import.meta.url);
  for (const pkg of ['three', '@gltf-transform/core']) {
    const dir = dirname(require.resolve(pkg));
    const manifest = findPackageJson(dir);
    hash.update(`${pkg}@${JSON.parse(readFileSync(manifest, 'utf8')).version}\n`);
  }
  return hash.digest('hex');
}

function findPackageJson(from: string): string {
  let dir = from;
  for (;;) {
    const candidate = join(dir, 'package.json');
    if (existsSync(candidate)) return candidate;
    const up = dirname(dir);
    if (up === dir) throw new Error(`no package.json above ${from}`);
    dir = up;
  }
}

/** The manifest in `filesDir`, or null when absent or unreadable. */
export function readManifest(filesDir: string): Manifest | null {
  try {
    return JSON.parse(readFileSync(join(filesDir, 'manifest.json'), 'utf8')) as Manifest;
  } catch {
    return null;
  }
}

/** True when the manifest matches `hash` and every file it lists is present and intact. */
export function isCurrent(filesDir: string, manifest: Manifest | null, hash: string): boolean {
  if (!manifest || manifest.inputsHash !== hash) return false;
  return manifest.files.every((f) => {
    const path = join(filesDir, f.path);
    if (!existsSync(path)) return false;
    const bytes = readFileSync(path);
    return bytes.length === f.bytes && sha256(bytes) === f.sha256;
  });
}
