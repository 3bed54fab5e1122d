// Skeleton from a glTF skin: joint order, hierarchy, rest TRS and inverse bind matrices.
import type { Node, Skin } from '@gltf-transform/core';
import { SolverInputError } from '../errors.js';
import { mat4Identity } from '../linalg/mat4.js';
import { parentsFirstOrder } from '../rig/skeleton.js';
import type { Skeleton } from '../types.js';
import { accessorFloats } from './gltf-accessors.js';

/** A skeleton and, for each skin joint index, its index in the skeleton. */
export interface SkinSkeleton {
  /** The skeleton, parents first. */
  skeleton: Skeleton;
  /** Skeleton index of skin joint k (JOINTS_0 values refer to skin order). */
  skinToSkeleton: Int32Array;
  /** The joint nodes in skeleton order. */
  nodes: Node[];
}

/** Builds the skeleton of `skin`; warns (into `warnings`) about renamed or reordered joints. */
export function readSkinSkeleton(skin: Skin, warnings: string[]): SkinSkeleton {
  const skinNodes = skin.listJoints();
  if (skinNodes.length === 0) {
    throw new SolverInputError('NO_SKINNED_MESH', 'the skin lists no joints', {
      item: skin.getName() || 'skin',
    });
  }
  const indexOf = new Map<Node, number>();
  skinNodes.forEach((n, k) => indexOf.set(n, k));
  const skinParents = skinNodes.map((n) => {
    for (let p = n.getParentNode(); p; p = p.getParentNode()) {
      const k = indexOf.get(p);
      if (k !== undefined) return k;
    }
    return -1;
  });
  const order = parentsFirstOrder(skinParents);
  if (order.some((k, i) => k !== i)) warnings.push('joints reordered so that parents come first');
  const skinToSkeleton = new Int32Array(skinNodes.length);
  order.forEach((k, j) => (skinToSkeleton[k] = j));
  const count = order.length;
  const names: string[] = [];
  const seen = new Set<string>();
  const parents = new Int32Array(count);
  const restTranslations = new Float64Array(3 * count);
  const restRotations = new Float64Array(4 * count);
  const restScales = new Float64Array(3 * count);
  const inverseBindMatrices = new Float64Array(16 * count);
  const ibmAccessor = skin.getInverseBindMatrices();
  const ibm = ibmAccessor ? accessorFloats(ibmAccessor) : null;
  if (ibm && ibm.length < 16 * count) {
    throw new SolverInputError('MISSING_JOINT', 'fewer inverse bind matrices than joints', {
      item: 'inverseBindMatrices',
    });
  }
  order.forEach((k, j) => {
    const node = skinNodes[k];
    let name = node.getName() || `joint_${k}`;
    if (seen.has(name)) {
      const renamed = `${name}_${k}`;
      warnings.push(`duplicate joint name "${name}" renamed to "${renamed}"`);
      name = renamed;
    }
    seen.add(name);
    names.push(name);
    parents[j] = skinParents[k] >= 0 ? skinToSkeleton[skinParents[k]] : -1;
    restTranslations.set(node.getTranslation(), 3 * j);
    restRotations.set(node.getRotation(), 4 * j);
    restScales.set(node.getScale(), 3 * j);
    if (ibm) {
      for (let e = 0; e < 16; e++) {
        const v = ibm[16 * k + e];
        if (!Number.isFinite(v)) {
          throw new SolverInputError(
            'NON_FINITE_VALUE',
            `inverse bind matrix of joint "${name}" is not finite`,
            { joint: name },
          );
        }
        inverseBindMatrices[16 * j + e] = v;
      }
    } else mat4Identity(inverseBindMatrices, 16 * j);
  });
  for (let i = 0; i < restTranslations.length; i++) {
    if (!Number.isFinite(restTranslations[i]) || !Number.isFinite(restScales[i])) {
      const joint = names[Math.floor(i / 3)];
      throw new SolverInputError('NON_FINITE_VALUE', `rest transform of "${joint}" is not finite`, {
        joint,
      });
    }
  }
  const rootParentMatrix = rootParentWorld(
    order.map((k) => skinNodes[k]),
    parents,
    warnings,
  );
  return {
    skeleton: {
      names,
      parents,
      restTranslations,
      restRotations,
      restScales,
      inverseBindMatrices,
      rootParentMatrix,
    },
    skinToSkeleton,
    nodes: order.map((k) => skinNodes[k]),
  };
}

/** World matrix of the node above the root joints (identity when the roots are scene roots). */
function rootParentWorld(nodes: Node[], parents: Int32Array, warnings: string[]): Float64Array {
  const out = mat4Identity(new Float64Array(16), 0) as Float64Array;
  let first: number[] | null = null;
  nodes.forEach((node, j) => {
    if (parents[j] >= 0) return;
    const p = node.getParentNode();
    const m = p ? Array.from(p.getWorldMatrix()) : null;
    const flat = m ?? Array.from(out);
    if (!first) {
      first = flat;
      out.set(flat);
    } else if (flat.some((v, i) => Math.abs(v - first![i]) > 1e-9)) {
      warnings.push('root joints sit under different transforms; using the first one');
    }
  });
  return out;
}
