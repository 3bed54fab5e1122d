// The library's 3D view: a renderer in a container, orbit controls, a floor grid sized to the
// subject, soft lights, and a camera framed on whatever is shown.
import {
  AmbientLight,
  Box3,
  Color,
  DirectionalLight,
  GridHelper,
  HemisphereLight,
  PerspectiveCamera,
  Scene,
  Sphere,
  Timer,
  Vector3,
  WebGLRenderer,
  type Object3D,
} from 'three';
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js';

/** Called every frame with the seconds since the last one. */
export type FrameCallback = (deltaSeconds: number) => void;

// Scratch for framing, allocated once.
const box = new Box3();
const sphere = new Sphere();
const direction = new Vector3();
const size = new Vector3();
const center = new Vector3();

/** A live 3D view inside a container element; call dispose() when done. */
export class PreviewViewer {
  readonly scene = new Scene();
  readonly camera = new PerspectiveCamera(35, 16 / 9, 0.01, 1000);
  private readonly renderer: WebGLRenderer;
  private readonly controls: OrbitControls;
  private readonly resize: ResizeObserver;
  private readonly timer = new Timer();
  private grid: GridHelper | null = null;
  private subject: Object3D | null = null;
  private bounds: Box3 | null = null;
  private onFrame: FrameCallback | null = null;

  constructor(private readonly container: HTMLElement) {
    this.renderer = new WebGLRenderer({ antialias: true, preserveDrawingBuffer: true });
    this.renderer.setPixelRatio(Math.min(window.devicePixelRatio, 2));
    this.renderer.domElement.tabIndex = 0;
    this.renderer.domElement.setAttribute('aria-label', 'Drag to orbit, scroll to zoom');
    container.appendChild(this.renderer.domElement);
    this.scene.background = new Color('#181818');
    this.scene.add(new HemisphereLight('#f2efe9', '#6b625a', 1.6));
    this.scene.add(new AmbientLight('#ffffff', 0.6));
    const key = new DirectionalLight('#fff4e0', 2.2);
    key.position.set(3, 6, 4);
    this.scene.add(key);
    const rim = new DirectionalLight('#ffb84d', 0.8);
    rim.position.set(-4, 3, -5);
    this.scene.add(rim);
    this.controls = new OrbitControls(this.camera, this.renderer.domElement);
    this.controls.enableDamping = true;
    this.controls.listenToKeyEvents(this.renderer.domElement);
    this.resize = new ResizeObserver(() => this.fit());
    this.resize.observe(container);
    this.fit();
    this.renderer.setAnimationLoop(() => this.tick());
  }

  /** Replaces what is shown and frames the camera and the floor grid on `bounds` (default: its box now). */
  show(subject: Object3D, bounds?: Box3): void {
    if (this.subject) this.scene.remove(this.subject);
    this.subject = subject;
    this.bounds = bounds && !bounds.isEmpty() ? bounds.clone() : null;
    this.scene.add(subject);
    this.frame();
  }

  /** Sets the per-frame callback (animation playback). */
  setFrameCallback(callback: FrameCallback | null): void {
    this.onFrame = callback;
  }

  /**
   * Points the camera at the subject from a little above and to the side, across its longest
   * horizontal extent (a walk is seen from the side), at the distance that fits it in the view.
   */
  frame(): void {
    if (!this.subject) return;
    this.subject.updateMatrixWorld(true);
    if (this.bounds) box.copy(this.bounds);
    else box.setFromObject(this.subject, true);
    if (box.isEmpty()) return;
    box.getSize(size);
    box.getCenter(center);
    const alongZ = size.z > size.x;
    const width = Math.max(alongZ ? size.z : size.x, 1e-3);
    const depth = alongZ ? size.x : size.z;
    const vertical = (this.camera.fov * Math.PI) / 180;
    const horizontal = 2 * Math.atan(Math.tan(vertical / 2) * this.camera.aspect);
    const distance =
      Math.max(size.y / 2 / Math.tan(vertical / 2), width / 2 / Math.tan(horizontal / 2)) * 1.2 +
      depth / 2;
    // Seen from the front (or the side for motion along z), turned a quarter of a right angle.
    const turn = (alongZ ? Math.PI / 2 : 0) + 0.4;
    direction.set(Math.sin(turn), 0.3, Math.cos(turn)).normalize();
    this.camera.position.copy(center).addScaledVector(direction, distance);
    this.camera.near = distance / 100;
    this.camera.far = distance * 100;
    this.camera.updateProjectionMatrix();
    this.controls.target.copy(center);
    this.controls.update();
    box.getBoundingSphere(sphere);
    this.placeGrid(Math.max(sphere.radius, 1e-3), box.min.y);
  }

  /** Stops drawing and frees the GPU resources. */
  dispose(): void {
    this.renderer.setAnimationLoop(null);
    this.resize.disconnect();
    this.controls.dispose();
    this.grid?.geometry.dispose();
    this.renderer.dispose();
    this.renderer.domElement.remove();
  }

  private placeGrid(radius: number, floorY: number): void {
    if (this.grid) {
      this.scene.remove(this.grid);
      this.grid.geometry.dispose();
    }
    // About a dozen cells of a round size (1, 2 or 5 times a power of ten) across four radii.
    const rough = (radius * 4) / 12;
    const power = 10 ** Math.floor(Math.log10(rough));
    const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= rough) ?? rough;
    const size = Math.ceil((radius * 4) / step) * step;
    this.grid = new GridHelper(size, Math.round(size / step), '#8a6a2a', '#3a3a3a');
    this.grid.position.y = floorY;
    this.scene.add(this.grid);
  }

  private fit(): void {
    const width = Math.max(1, this.container.clientWidth);
    const height = Math.max(1, this.container.clientHeight);
    this.renderer.setSize(width, height, false);
    this.camera.aspect = width / height;
    this.camera.updateProjectionMatrix();
  }

  private tick(): void {
    this.timer.update();
    this.onFrame?.(Math.min(this.timer.getDelta(), 0.1));
    this.controls.update();
    this.renderer.render(this.scene, this.camera);
  }
}
