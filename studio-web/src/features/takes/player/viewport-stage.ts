// The viewport's three.js stage: renderer, camera with orbit controls, floor grid and lights,
// and up to two takes shown alone, side by side (one camera, split view) or overlaid. Renders
// only when something changed.
import {
  Box3,
  Color,
  DirectionalLight,
  GridHelper,
  HemisphereLight,
  MeshBasicMaterial,
  PerspectiveCamera,
  Scene,
  Vector3,
  WebGLRenderer,
} from 'three';
import { OrbitControls } from 'three/addons/controls/OrbitControls.js';
import type { TakeActor } from './take-actor';

/** How the compared take is shown beside the main one. */
export type CompareLayout = 'side-by-side' | 'overlay';

/** Layer of the main take, and of the compared one (layer 0: grid and lights, seen by all). */
export const MAIN_LAYER = 1;
export const OTHER_LAYER = 2;

const BACKGROUND = new Color('#18191b');

/** The 3D view of one or two takes. */
export class ViewportStage {
  readonly renderer: WebGLRenderer;
  readonly scene = new Scene();
  readonly camera = new PerspectiveCamera(35, 1, 0.01, 200);
  readonly controls: OrbitControls;
  /** The material the overlaid take is drawn with: a thin amber wireframe. */
  readonly ghostMaterial = new MeshBasicMaterial({
    color: '#f5b94a',
    wireframe: true,
    transparent: true,
    opacity: 0.45,
    depthWrite: false,
  });
  private main: TakeActor | null = null;
  private other: TakeActor | null = null;
  private layout: CompareLayout = 'side-by-side';
  private width = 1;
  private height = 1;
  private frameRequest = 0;
  /** Keep the camera on the character as it travels (horizontally; height changes still show). */
  private follow = true;
  /** Where the main take's root joint was when the camera last moved with it. */
  private anchor: Vector3 | null = null;
  /** Called after each render (the page reads it to know a frame was drawn). */
  onRender: (() => void) | null = null;

  constructor(canvas: HTMLCanvasElement) {
    this.renderer = new WebGLRenderer({ canvas, antialias: true });
    this.renderer.setPixelRatio(Math.min(window.devicePixelRatio || 1, 2));
    this.scene.background = BACKGROUND;
    // Sky and a warm bounce from the floor, so undersides (a belly, the arms) keep their shape.
    this.scene.add(new HemisphereLight('#dfe3ea', '#6b6156', 1.7));
    const key = new DirectionalLight('#ffffff', 2.2);
    key.position.set(2.5, 4, 3);
    this.scene.add(key);
    const rim = new DirectionalLight('#ffd9a0', 0.9);
    rim.position.set(-3, 2.5, -2.5);
    this.scene.add(rim);
    const fill = new DirectionalLight('#e8ecf5', 0.7);
    fill.position.set(-1.5, 0.6, 3);
    this.scene.add(fill);
    const grid = new GridHelper(10, 40, '#5b5e63', '#303236');
    this.scene.add(grid);
    this.camera.position.set(2.2, 1.6, 3.4);
    this.controls = new OrbitControls(this.camera, canvas);
    this.controls.enableDamping = false;
    this.controls.addEventListener('change', () => this.invalidate());
  }

  /** Sets the main take (its actor must be on MAIN_LAYER). */
  setMain(actor: TakeActor | null): void {
    if (this.main) this.scene.remove(this.main.root);
    this.main = actor;
    if (actor) this.scene.add(actor.root);
    this.invalidate();
  }

  /** Sets the compared take (on OTHER_LAYER), or none. */
  setOther(actor: TakeActor | null): void {
    if (this.other) {
      this.other.setMaterial(null);
      this.scene.remove(this.other.root);
    }
    this.other = actor;
    if (actor) this.scene.add(actor.root);
    this.invalidate();
  }

  /** Side by side or overlaid (the caller draws the overlaid take with `ghostMaterial`). */
  setLayout(layout: CompareLayout): void {
    this.layout = layout;
    this.invalidate();
  }

  /** Poses every take at frame `index`; a following camera moves with the character. */
  setFrame(index: number): void {
    this.main?.setFrame(index);
    this.other?.setFrame(index);
    if (this.follow) this.followCharacter();
    this.invalidate();
  }

  /** Turns following the character on or off. */
  setFollow(on: boolean): void {
    this.follow = on;
    this.anchor = on ? this.rootPosition() : null;
  }

  /** World position of the main take's root joint (its bones are posed by the last frame set). */
  private rootPosition(): Vector3 | null {
    const bone = this.main?.mesh.skeleton.bones[0];
    if (!bone || !this.main) return null;
    this.main.root.updateMatrixWorld(true);
    return bone.getWorldPosition(new Vector3());
  }

  private followCharacter(): void {
    const now = this.rootPosition();
    if (!now) return;
    if (this.anchor) {
      const delta = now.clone().sub(this.anchor);
      delta.y = 0;
      this.camera.position.add(delta);
      this.controls.target.add(delta);
      this.controls.update();
    }
    this.anchor = now;
  }

  /** Points the camera at the main take so it fills the view, standing on the grid. */
  frameCharacter(): void {
    if (!this.main) return;
    // The bones are not children of the mesh: update the whole take so skinning sees their pose.
    this.main.root.updateMatrixWorld(true);
    const box = new Box3().setFromObject(this.main.root, true);
    if (box.isEmpty()) return;
    const size = box.getSize(new Vector3());
    const centre = box.getCenter(new Vector3());
    const fov = (this.camera.fov * Math.PI) / 180;
    const aspect = this.viewAspect();
    const fitHeight = size.y / 2 / Math.tan(fov / 2);
    const fitWidth = Math.max(size.x, size.z) / 2 / (Math.tan(fov / 2) * aspect);
    const distance = 1.15 * Math.max(fitHeight, fitWidth) + Math.max(size.x, size.z) / 2;
    const direction = new Vector3(0.45, 0.22, 1).normalize();
    this.camera.position.copy(centre).addScaledVector(direction, distance);
    this.camera.near = Math.max(0.005, distance / 100);
    this.camera.far = distance * 50;
    this.controls.target.copy(centre);
    this.controls.update();
    this.anchor = this.rootPosition();
    this.invalidate();
  }

  private split(): boolean {
    return this.other !== null && this.layout === 'side-by-side';
  }

  private viewAspect(): number {
    return (this.split() ? this.width / 2 : this.width) / this.height;
  }

  /** Resizes the drawing buffer to the element's size in CSS pixels. */
  setSize(width: number, height: number): void {
    this.width = Math.max(1, Math.floor(width));
    this.height = Math.max(1, Math.floor(height));
    this.renderer.setSize(this.width, this.height, false);
    this.invalidate();
  }

  /** Asks for a render on the next animation frame (at most one per frame). */
  invalidate(): void {
    if (this.frameRequest) return;
    this.frameRequest = requestAnimationFrame(() => {
      this.frameRequest = 0;
      this.render();
    });
  }

  /** Draws now. */
  render(): void {
    const { renderer, camera, scene } = this;
    camera.aspect = this.viewAspect();
    camera.updateProjectionMatrix();
    if (!this.split()) {
      renderer.setScissorTest(false);
      renderer.setViewport(0, 0, this.width, this.height);
      camera.layers.set(0);
      camera.layers.enable(MAIN_LAYER);
      if (this.other) camera.layers.enable(OTHER_LAYER);
      renderer.render(scene, camera);
    } else {
      const half = Math.floor(this.width / 2);
      renderer.setScissorTest(true);
      // Left: the compared take (the reference); right: the main take.
      for (const [x, w, layer] of [
        [0, half, OTHER_LAYER],
        [half, this.width - half, MAIN_LAYER],
      ] as const) {
        renderer.setViewport(x, 0, w, this.height);
        renderer.setScissor(x, 0, w, this.height);
        camera.layers.set(0);
        camera.layers.enable(layer);
        renderer.render(scene, camera);
      }
      renderer.setScissorTest(false);
    }
    this.onRender?.();
  }

  /** Frees the GPU resources; the stage cannot be used afterwards. */
  dispose(): void {
    cancelAnimationFrame(this.frameRequest);
    this.controls.dispose();
    this.ghostMaterial.dispose();
    this.renderer.dispose();
  }
}
