// `npm run generate -w @overshoot/assets-sample`: writes the invented sample files into files/.
// Skips the work (in well under a second) when files/manifest.json shows they are current;
// `-- --force` generates anyway.
import { mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { inputsHash, isCurrent, readManifest, sha256, type Manifest } from './manifest.js';
import { GENERATOR, SEED } from './scenario.js';

const GENERATOR_DIR = dirname(fileURLToPath(import.meta.url));
const FILES_DIR = join(GENERATOR_DIR, '..', 'files');

function existingFiles(dir: string): string[] {
  const out: string[] = [];
  try {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const path = join(dir, e.name);
      if (e.isDirectory()) out.push(...existingFiles(path));
      else out.push(relative(FILES_DIR, path));
    }
  } catch {
    // No folder yet: nothing to clean.
  }
  return out;
}

async function main(): Promise<void> {
  const started = Date.now();
  const hash = inputsHash(GENERATOR_DIR, SEED);
  const old = readManifest(FILES_DIR);
  if (!process.argv.includes('--force') && isCurrent(FILES_DIR, old, hash)) {
    const mb = (old!.totalBytes / 1e6).toFixed(1);
    console.log(`[assets-sample] sample files are current (${old!.files.length} files, ${mb} MB)`);
    return;
  }
  console.log('[assets-sample] generating invented sample files…');
  const { generateAll } = await import('./generate-all.js');
  const { files, index } = await generateAll({ seed: SEED });
  // Remove files an earlier generator version wrote and this one does not.
  for (const path of existingFiles(FILES_DIR)) {
    if (path !== 'manifest.json' && !files.has(path)) rmSync(join(FILES_DIR, path));
  }
  const listed = [...files.keys()].sort();
  for (const path of listed) {
    mkdirSync(dirname(join(FILES_DIR, path)), { recursive: true });
    writeFileSync(join(FILES_DIR, path), files.get(path)!);
  }
  const entries = listed.map((path) => ({
    path,
    bytes: files.get(path)!.length,
    sha256: sha256(files.get(path)!),
  }));
  const manifest: Manifest = {
    invented: true,
    notice: 'Invented sample data for the Overshoot demo and tests; see assets-sample/README.md.',
    generator: GENERATOR,
    seed: SEED,
    inputsHash: hash,
    totalBytes: entries.reduce((s, f) => s + f.bytes, 0),
    ...index,
    files: entries,
  };
  writeFileSync(join(FILES_DIR, 'manifest.json'), JSON.stringify(manifest, null, 2) + '\n');
  const mb = (manifest.totalBytes / 1e6).toFixed(1);
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  console.log(`[assets-sample] wrote ${entries.length} files, ${mb} MB, in ${seconds} s`);
}

main().catch((e: unknown) => {
  console.error(`[assets-sample] generation failed: ${e instanceof Error ? e.stack : String(e)}`);
  process.exit(1);
});
