// Makes a capture .glb play correctly in any glTF viewer. Its morph targets hold the captured,
// already posed positions; glTF applies morph targets before skinning, so a capture mesh that
// is also bound to the animated skin would be transformed twice. The mesh node is unbound and its
// joint and weight attributes dropped; the skin stays in the file, so readers still find the
// skeleton that the joint animation drives.
import type { Document } from '@gltf-transform/core';

/** Unbinds every mesh with morph targets from its skin (in place). */
export function unbindCaptureMesh(doc: Document): void {
  for (const node of doc.getRoot().listNodes()) {
    const mesh = node.getMesh();
    if (!mesh || !node.getSkin()) continue;
    const prims = mesh.listPrimitives();
    if (!prims.some((p) => p.listTargets().length > 0)) continue;
    node.setSkin(null);
    for (const prim of prims) {
      for (const semantic of ['JOINTS_0', 'WEIGHTS_0']) {
        const accessor = prim.getAttribute(semantic);
        prim.setAttribute(semantic, null);
        if (accessor && accessor.listParents().length <= 1) accessor.dispose();
      }
    }
  }
}
