// A skeleton drawn as lines between each joint and its parent, with a dot per joint: works for
// BVH bones and for the plain nodes of a glTF animation alike (no skin needed).
import {
  BufferAttribute,
  BufferGeometry,
  Group,
  LineBasicMaterial,
  LineSegments,
  Points,
  PointsMaterial,
  Vector3,
  type Object3D,
} from 'three';

const world = new Vector3();

/** Lines between joints that follow the joints as they move; call update() after posing. */
export class StickFigure extends Group {
  private readonly joints: Object3D[];
  private readonly pairs: [Object3D, Object3D][];
  private readonly lineGeometry = new BufferGeometry();
  private readonly pointGeometry = new BufferGeometry();

  /** Draws every joint under `root` whose name passes `isJoint` (default: every named node). */
  constructor(root: Object3D, isJoint: (o: Object3D) => boolean = (o) => o.name !== '') {
    super();
    this.name = 'stick-figure';
    const joints: Object3D[] = [];
    root.traverse((o) => {
      if (o !== root && isJoint(o)) joints.push(o);
    });
    this.joints = joints;
    this.pairs = joints.flatMap((j) =>
      j.parent && joints.includes(j.parent) ? [[j.parent, j] as [Object3D, Object3D]] : [],
    );
    this.lineGeometry.setAttribute(
      'position',
      new BufferAttribute(new Float32Array(this.pairs.length * 6), 3),
    );
    this.pointGeometry.setAttribute(
      'position',
      new BufferAttribute(new Float32Array(joints.length * 3), 3),
    );
    this.add(new LineSegments(this.lineGeometry, new LineBasicMaterial({ color: '#ffc53d' })));
    this.add(
      new Points(
        this.pointGeometry,
        new PointsMaterial({ color: '#f2efe9', size: 5, sizeAttenuation: false }),
      ),
    );
    // The figure holds world positions: it must not inherit a transform.
    this.matrixAutoUpdate = false;
    this.update();
  }

  /** Number of joints drawn. */
  get jointCount(): number {
    return this.joints.length;
  }

  /** Moves the lines and dots to the joints' current world positions. */
  update(): void {
    this.joints[0]?.parent?.updateMatrixWorld(true);
    const lines = this.lineGeometry.getAttribute('position') as BufferAttribute;
    this.pairs.forEach(([a, b], i) => {
      a.getWorldPosition(world);
      lines.setXYZ(2 * i, world.x, world.y, world.z);
      b.getWorldPosition(world);
      lines.setXYZ(2 * i + 1, world.x, world.y, world.z);
    });
    lines.needsUpdate = true;
    const points = this.pointGeometry.getAttribute('position') as BufferAttribute;
    this.joints.forEach((j, i) => {
      j.getWorldPosition(world);
      points.setXYZ(i, world.x, world.y, world.z);
    });
    points.needsUpdate = true;
    this.lineGeometry.computeBoundingSphere();
    this.pointGeometry.computeBoundingSphere();
    this.lineGeometry.computeBoundingBox();
  }

  /** Frees the figure's buffers. */
  release(): void {
    this.lineGeometry.dispose();
    this.pointGeometry.dispose();
  }
}
