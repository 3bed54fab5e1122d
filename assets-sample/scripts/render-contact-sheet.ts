// Renders preview/contact-sheet.png: every generated character at rest, at a mid-clip frame and
// coloured by region, and every capture against skinning alone, drawn by three.js in headless
// Chromium. three's modules and the .glb files
// come from a loopback HTTP server on a random port; every other request is refused.
import { createServer, type Server } from 'node:http';
import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, extname, join, normalize, resolve, sep } from 'node:path';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';
import type { AssetIndex, CaptureEntry } from '../generate/asset-index.js';
import { renderContactSheet, type SheetItem } from './contact-sheet-page.js';

const HERE = dirname(fileURLToPath(import.meta.url));
const PACKAGE = resolve(HERE, '..');
const FILES = join(PACKAGE, 'files');
const THREE_DIR = resolve(dirname(createRequire(import.meta.url).resolve('three')), '..');

/** Chromium flags: software GL, no network services, no sandbox (runs as root in containers). */
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-dev-shm-usage',
  '--use-angle=swiftshader',
  '--enable-unsafe-swiftshader',
];

const TYPES: Record<string, string> = {
  '.html': 'text/html',
  '.js': 'text/javascript',
  '.glb': 'model/gltf-binary',
  '.json': 'application/json',
};

const PAGE = `<!doctype html><html><head><meta charset="utf-8">
<script type="importmap">{"imports":{"three":"/three/build/three.module.js","three/addons/":"/three/examples/jsm/"}}</script>
</head><body style="margin:0;background:#1d1f22"></body></html>`;

/** Maps a URL path under a mount point to a file inside `base`, or null when outside it. */
function inside(base: string, rest: string): string | null {
  const path = normalize(join(base, decodeURIComponent(rest)));
  return path.startsWith(base + sep) ? path : null;
}

function serve(): Promise<{ server: Server; origin: string }> {
  const server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    let file: string | null = null;
    if (url.pathname === '/') {
      res.writeHead(200, { 'content-type': 'text/html' }).end(PAGE);
      return;
    }
    if (url.pathname.startsWith('/three/')) file = inside(THREE_DIR, url.pathname.slice(7));
    if (url.pathname.startsWith('/files/')) file = inside(FILES, url.pathname.slice(7));
    if (!file) {
      res.writeHead(404).end();
      return;
    }
    readFile(file).then(
      (body) => res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream' }).end(body), // prettier-ignore
      () => res.writeHead(404).end(),
    );
  });
  return new Promise((ok) =>
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      ok({ server, origin: `http://127.0.0.1:${port}` });
    }),
  );
}

type Manifest = Pick<AssetIndex, 'characters' | 'captures'>;

/** Time (s) of the capture frame where the known modes move the most. */
async function liveliestTime(c: CaptureEntry): Promise<number> {
  const truth = JSON.parse(await readFile(join(FILES, c.groundTruth), 'utf8'));
  const bin = await readFile(join(dirname(join(FILES, c.groundTruth)), truth.arrays.file));
  const e = truth.arrays.entries.modeResponses;
  const view = new DataView(bin.buffer, bin.byteOffset + e.byteOffset, e.byteLength);
  const [frames, modes] = e.shape as [number, number];
  let best = 0;
  let bestFrame = 0;
  for (let f = 0; f < frames; f++) {
    let sum = 0;
    for (let k = 0; k < modes; k++) sum += Math.abs(view.getFloat64(8 * (f * modes + k), true));
    if (sum > best) [best, bestFrame] = [sum, f];
  }
  // Just past the frame's instant: STEP morph weights and LINEAR joints then agree on the frame.
  return bestFrame / truth.fps + 1e-4;
}

/** Value after a command-line flag (`--only coach`, `--cell 600x700`), or undefined. */
function argValue(flag: string): string | undefined {
  const i = process.argv.indexOf(flag);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

async function main(): Promise<void> {
  const manifest = JSON.parse(await readFile(join(FILES, 'manifest.json'), 'utf8')) as Manifest;
  const { server, origin } = await serve();
  const profile = await mkdtemp(join(tmpdir(), 'overshoot-sheet-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
    viewport: { width: 1200, height: 900 },
  });
  try {
    // Nothing leaves the machine: only the loopback server answers.
    await context.route('**/*', (route) =>
      route.request().url().startsWith(origin) ? route.continue() : route.abort(),
    );
    const page = await context.newPage();
    page.on('pageerror', (e) => console.error(`[page] ${e.message}`));
    // tsx names functions through a helper that the page does not have.
    await page.addInitScript('window.__name = (f) => f;');
    await page.goto(`${origin}/`);
    const only = argValue('--only');
    const [cellWidth, cellHeight] = (argValue('--cell') ?? '380x440').split('x').map(Number);
    const items: SheetItem[] = [];
    for (const c of manifest.characters) {
      if (only && !c.file.includes(only)) continue;
      items.push({
        kind: 'character',
        title: c.title,
        subtitle: `${c.triangles} triangles, ${c.joints} joints`,
        url: `/files/${c.file}`,
        characterUrl: null,
        clipUrl: c.previewClip ? `/files/${c.previewClip.file}` : null,
        clipLabel: c.previewClip?.name ?? '',
        time: null,
      });
    }
    for (const c of manifest.captures) {
      if (only && !c.file.includes(only)) continue;
      const noise = c.noiseSigmaMetres ? `, noise ${c.noiseSigmaMetres * 1000} mm` : '';
      items.push({
        kind: 'capture',
        title: `Capture: ${c.key}`,
        subtitle: `${c.frameCount} frames at ${c.fps} fps${noise}`,
        url: `/files/${c.file}`,
        characterUrl: `/files/${manifest.characters.find((x) => x.key === c.character)!.file}`,
        clipUrl: null,
        clipLabel: '',
        time: await liveliestTime(c),
      });
    }
    const dataUrl = await page.evaluate(renderContactSheet, {
      items,
      cellWidth,
      cellHeight,
      rows: (argValue('--rows') ?? '').split(',').filter(Boolean).map(Number),
    });
    const out = join(PACKAGE, 'preview', only ? `contact-sheet-${only}.png` : 'contact-sheet.png');
    await mkdir(dirname(out), { recursive: true });
    await writeFile(out, Buffer.from(dataUrl.replace(/^data:image\/png;base64,/, ''), 'base64'));
    console.log(`wrote ${out}`);
  } finally {
    await context.close();
    server.close();
    await rm(profile, { recursive: true, force: true });
  }
}

await main();
