// Character import from .glb: the largest skinned mesh, its skeleton, skin and regions.
import type { Document, Node } from '@gltf-transform/core';
import { SolverInputError } from '../errors.js';
import { deriveRegions, regionsFromLabels } from '../rig/regions.js';
import { normaliseSkinWeights, type SkinWeightOptions } from '../rig/skin-weights.js';
import type { Character } from '../types.js';
import { openGlb } from './glb-container.js';
import { computeNormals, meshVertexCount, readMeshGeometry } from './gltf-mesh.js';
import { readSkinSkeleton } from './gltf-skeleton.js';

/** Options for reading a character. */
export interface ReadCharacterOptions {
  /** Skin weight normalisation tolerance (see SKIN_WEIGHT_DEFAULTS). */
  weightTolerance?: number;
}

/** Default character read options. */
export const READ_CHARACTER_DEFAULTS: Required<ReadCharacterOptions> = { weightTolerance: 0.05 };

/** Reads a rigged character from .glb bytes. */
export async function readCharacter(
  bytes: Uint8Array,
  options: ReadCharacterOptions = {},
): Promise<Character> {
  return characterFromDocument(await openGlb(bytes), options);
}

/** The skinned mesh nodes of a document, largest first. */
export function listSkinnedNodes(doc: Document): Node[] {
  return doc
    .getRoot()
    .listNodes()
    .filter((n) => n.getMesh() && n.getSkin())
    .sort((a, b) => meshVertexCount(b.getMesh()!) - meshVertexCount(a.getMesh()!));
}

/** Reads the character held by an already parsed document. */
export function characterFromDocument(
  doc: Document,
  options: ReadCharacterOptions = {},
): Character {
  const opts = { ...READ_CHARACTER_DEFAULTS, ...options };
  const warnings: string[] = [];
  const skinned = listSkinnedNodes(doc);
  if (skinned.length === 0) {
    throw new SolverInputError('NO_SKINNED_MESH', 'the file has no mesh bound to a skin', {});
  }
  const node = skinned[0];
  const mesh = node.getMesh()!;
  const name = mesh.getName() || node.getName() || 'mesh';
  if (skinned.length > 1) {
    const others = skinned.slice(1).map((n) => n.getMesh()!.getName() || n.getName() || '?');
    warnings.push(
      `${skinned.length} skinned meshes; using the largest, "${name}" (ignored: ${others.join(', ')})`,
    );
  }
  const { skeleton, skinToSkeleton } = readSkinSkeleton(node.getSkin()!, warnings);
  const geometry = readMeshGeometry(mesh, warnings);
  if (geometry.jointSets.length === 0) {
    throw new SolverInputError('NO_SKINNED_MESH', `"${name}" has no JOINTS_0/WEIGHTS_0`, {
      item: name,
    });
  }
  const n = geometry.positions.length / 3;
  const skinOpts: SkinWeightOptions = { tolerance: opts.weightTolerance };
  const skin = normaliseSkinWeights(
    geometry.jointSets,
    geometry.weightSets,
    n,
    skinToSkeleton.length,
    skinOpts,
  );
  for (let i = 0; i < skin.joints.length; i++) skin.joints[i] = skinToSkeleton[skin.joints[i]];
  if (skin.renormalised > 0)
    warnings.push(`${skin.renormalised} vertices had weights renormalised`);
  if (skin.truncated > 0) {
    warnings.push(`${skin.truncated} vertices had more than 4 influences; kept the largest 4`);
  }
  const regionNames =
    geometry.primitives[0].getExtras()['regionNames'] ?? mesh.getExtras()['regionNames'];
  const regions = geometry.regionValues
    ? regionsFromLabels(geometry.regionValues, regionNames)
    : deriveRegions(skin.joints, skin.weights, skeleton.names);
  const character: Character = {
    name,
    restPositions: geometry.positions,
    restNormals: geometry.normals ?? computeNormals(geometry.positions, geometry.triangles),
    triangles: geometry.triangles,
    skeleton,
    skinJoints: skin.joints,
    skinWeights: skin.weights,
    regions,
    warnings,
  };
  checkUnits(character);
  return character;
}

/** Warns when the mesh size suggests a unit other than metres (common practice heuristic). */
function checkUnits(character: Character): void {
  const p = character.restPositions;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < p.length; i++) {
    if (p[i] < lo) lo = p[i];
    if (p[i] > hi) hi = p[i];
  }
  const extent = hi - lo;
  if (extent > 20) {
    character.warnings.push(
      `mesh spans ${extent.toFixed(1)} units; glTF is in metres (centimetres?)`,
    );
  } else if (extent > 0 && extent < 0.05) {
    character.warnings.push(`mesh spans only ${extent.toFixed(4)} units; glTF is in metres`);
  }
}
