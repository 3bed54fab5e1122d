// Builds every sample file in memory: characters, clips (BVH and glTF), synthetic captures with
// ground truth, and the demo show seed. Pure and deterministic: same options, same bytes.
import { writeCaptureGlb, writeCharacterGlb, writeClipGlb } from '@overshoot/solver';
import type { AssetIndex, CaptureEntry, CharacterEntry, ClipEntry } from './asset-index.js';
import type { BodyPlan } from './body/body-plan.js';
import { buildCharacter, type BuiltCharacter } from './body/build-character.js';
import { coachPlan } from './body/coach.js';
import { creaturePlan } from './body/creature.js';
import { swimmerPlan } from './body/swimmer.js';
import { buildCapture } from './capture/build-capture.js';
import { COACH_TISSUE } from './capture/coach-tissue.js';
import { groundTruth } from './capture/ground-truth.js';
import { writeBvh } from './io/bvh-writer.js';
import { INVENTED_NOTICE, stampGlb, type SampleLabel } from './io/stamp-glb.js';
import { poolsideDrill, whistleAndBounce } from './motion/capture-scripts.js';
import * as clips from './motion/clip-scripts.js';
import type { MotionScript } from './motion/motion-script.js';
import { rigInfo } from './motion/rig-info.js';
import { sampleClip } from './motion/sample-motion.js';
import { demoShow } from './show/demo-show.js';
import { GENERATOR, SCENARIO, seedFor } from './scenario.js';

/** Generator options. */
export interface GenerateOptions {
  /** Master seed (capture noise derives from it). */
  seed: number;
  /** Multiplies every meshing cell size: 2 gives about a quarter of the triangles. */
  cellScale?: number;
  /** Shortens captures to this many seconds (tests); null keeps their full length. */
  captureSeconds?: number | null;
}

/** Generated files by path (relative to files/) and the index of what they are. */
export interface GeneratedSet {
  files: Map<string, Uint8Array>;
  index: AssetIndex;
}

const text = (s: string) => new TextEncoder().encode(s);
const json = (o: unknown) => text(JSON.stringify(o, null, 2) + '\n');

/** The capture character (coarse, so that 60 fps captures stay small) and the others. */
function plans(scale: number): { coach: BodyPlan; swimmer: BodyPlan; creature: BodyPlan } {
  return {
    coach: coachPlan(0.047 * scale),
    swimmer: swimmerPlan(0.019 * scale),
    creature: creaturePlan(0.03 * scale),
  };
}

/** Builds every file. */
export async function generateAll(options: GenerateOptions): Promise<GeneratedSet> {
  const { seed } = options;
  const files = new Map<string, Uint8Array>();
  const index: AssetIndex = { characters: [], clips: [], captures: [] };
  const label = (kind: SampleLabel['kind'], extra: Record<string, unknown>): SampleLabel => ({
    invented: true,
    notice: INVENTED_NOTICE,
    generator: GENERATOR,
    seed,
    kind,
    scenario: `${SCENARIO.show} (${SCENARIO.studio})`,
    ...extra,
  });
  const p = plans(options.cellScale ?? 1);
  const built = new Map<string, BuiltCharacter>();
  for (const plan of [p.coach, p.swimmer, p.creature]) {
    const b = buildCharacter(plan);
    built.set(plan.id, b);
    const file = `characters/${plan.id}.glb`;
    const entry: CharacterEntry = {
      key: plan.id,
      title: plan.title,
      description: plan.description,
      file,
      vertices: b.character.restPositions.length / 3,
      triangles: b.character.triangles.length / 3,
      joints: plan.joints.length,
      namingConvention: plan.namingConvention,
      regions: plan.regions,
      previewClip: null,
    };
    const { previewClip: _, ...about } = entry;
    files.set(
      file,
      await stampGlb(await writeCharacterGlb(b.character), label('character', about)),
    );
    index.characters.push(entry);
  }

  const addClip = async (script: MotionScript, characterKey: string) => {
    const b = built.get(characterKey)!;
    const clip = sampleClip(rigInfo(b.plan), script);
    const endSites: Record<string, [number, number, number]> = {};
    for (const j of b.plan.joints) {
      if (j.tip) endSites[j.name] = [j.tip[0] - j.at[0], j.tip[1] - j.at[1], j.tip[2] - j.at[2]];
    }
    const entry: ClipEntry = {
      key: script.id,
      title: script.title,
      description: script.description,
      character: characterKey,
      fps: script.fps,
      frameCount: clip.frameCount,
      bvh: `clips/${script.id}.bvh`,
      glb: `clips/${script.id}.glb`,
    };
    files.set(entry.bvh, text(writeBvh(clip, { endSites })));
    files.set(entry.glb, await stampGlb(await writeClipGlb(clip), label('clip', { ...entry })));
    index.clips.push(entry);
    const c = index.characters.find((x) => x.key === characterKey)!;
    c.previewClip ??= { file: entry.glb, name: entry.key };
  };
  await addClip(clips.coachWalk, p.coach.id);
  await addClip(clips.coachJump, p.coach.id);
  await addClip(clips.swimmerRun, p.swimmer.id);
  await addClip(clips.swimmerStopTurn, p.swimmer.id);
  await addClip(clips.creatureWaddle, p.creature.id);
  await addClip(clips.creatureIdle, p.creature.id);

  // Two captures of the coach: one noise-free, one with 0.3 mm of measurement noise.
  const recipes = [
    { script: poolsideDrill, noiseSigma: 0 },
    { script: whistleAndBounce, noiseSigma: 0.0003 },
  ];
  const coach = built.get(p.coach.id)!;
  for (const r of recipes) {
    const limit = options.captureSeconds;
    const script = limit ? { ...r.script, duration: Math.min(r.script.duration, limit) } : r.script;
    await addClip(script, p.coach.id);
    const noiseSeed = seedFor(seed, script.id);
    const cap = buildCapture(coach, { script, tissue: COACH_TISSUE, noiseSigma: r.noiseSigma, seed: noiseSeed }); // prettier-ignore
    const entry: CaptureEntry = {
      key: script.id,
      title: script.title,
      description: script.description,
      character: p.coach.id,
      clip: script.id,
      fps: script.fps,
      frameCount: cap.clip.frameCount,
      file: `captures/${script.id}.glb`,
      groundTruth: `captures/${script.id}.truth.json`,
      groundTruthBin: `captures/${script.id}.truth.bin`,
      noiseSigmaMetres: r.noiseSigma,
      modes: COACH_TISSUE.modes.map((m) => m.id),
    };
    const truth = groundTruth(coach, cap, {
      capture: entry.file,
      character: `characters/${p.coach.id}.glb`,
      clipBvh: `clips/${script.id}.bvh`,
      clipGlb: `clips/${script.id}.glb`,
      bin: `${script.id}.truth.bin`,
      seed,
      generator: GENERATOR,
      notice: INVENTED_NOTICE,
    });
    const bytes = await writeCaptureGlb(cap.capture, { character: coach.character });
    files.set(entry.file, await stampGlb(bytes, label('capture', { ...entry, noiseSeed })));
    files.set(entry.groundTruth, json(truth.json));
    files.set(entry.groundTruthBin, truth.bin);
    index.captures.push(entry);
  }
  files.set('show/demo-show.json', json(demoShow(index, seed)));
  return { files, index };
}
