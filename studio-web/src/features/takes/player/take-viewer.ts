// What the viewport shows, driven imperatively: the main take (live-tuned), optionally skinning
// alone or a second take beside or over it, and the displacement heat map; posed at a frame.
import { niceCeil } from './colour-ramp';
import { framePeaks, HeatMapPainter, robustPeak } from './heat-map';
import { TakeActor } from './take-actor';
import type { TakeModel } from './take-model';
import { MAIN_LAYER, OTHER_LAYER, ViewportStage, type CompareLayout } from './viewport-stage';

/** What the main take is compared with. */
export type CompareKind = 'none' | 'skinning' | 'take';

/** Listeners of a viewer. */
export interface TakeViewerEvents {
  /** The heat map's scale changed (millimetres at the top of the ramp; 0 when off). */
  onHeatScale?: (mm: number) => void;
  /** A frame was drawn. */
  onRender?: () => void;
}

/** The viewport's contents and how they are drawn. */
export class TakeViewer {
  readonly stage: ViewportStage;
  private model: TakeModel | null = null;
  private basis: Float32Array | null = null;
  private main: TakeActor | null = null;
  private other: TakeActor | null = null;
  private otherModel: TakeModel | null = null;
  private compare: CompareKind = 'none';
  private layout: CompareLayout = 'side-by-side';
  private heatOn = false;
  private mainPainter: HeatMapPainter | null = null;
  private otherPainter: HeatMapPainter | null = null;
  private scaleMetres = 0.001;
  private frame = 0;
  /** The camera has been pointed at the main take at the view's real size. */
  private framed = false;
  private sized = false;

  constructor(
    canvas: HTMLCanvasElement,
    private readonly events: TakeViewerEvents = {},
  ) {
    this.stage = new ViewportStage(canvas);
    this.stage.onRender = () => this.events.onRender?.();
  }

  /** Shows `model` as the main take, with `basis` its current morph targets (3N × K). */
  setModel(model: TakeModel, basis: Float32Array): void {
    if (model === this.model && basis === this.basis) return;
    const fresh = model !== this.model;
    this.model = model;
    this.basis = basis;
    if (!fresh) return;
    this.mainPainter?.dispose();
    this.mainPainter = null;
    this.main?.dispose();
    this.main = new TakeActor(model, { layer: MAIN_LAYER });
    this.stage.setMain(this.main);
    this.main.setFrame(Math.min(this.frame, model.frameCount - 1));
    this.framed = false;
    if (this.sized) this.frameCharacter();
    this.rebuildOther();
    this.refreshHeat();
  }

  /** Compares with nothing, skinning alone, or another take (`otherModel`). */
  setCompare(kind: CompareKind, otherModel: TakeModel | null): void {
    const model = kind === 'take' ? otherModel : null;
    if (kind === this.compare && model === this.otherModel) return;
    this.compare = kind;
    this.otherModel = model;
    this.rebuildOther();
    this.refreshHeat();
  }

  private rebuildOther(): void {
    this.otherPainter?.dispose();
    this.otherPainter = null;
    this.other?.dispose();
    this.other = null;
    const source = this.compare === 'skinning' ? this.model : this.otherModel;
    if (source && this.compare !== 'none') {
      this.other = new TakeActor(source, {
        layer: OTHER_LAYER,
        clone: true,
        skinningOnly: this.compare === 'skinning',
      });
      this.other.setFrame(Math.min(this.frame, source.frameCount - 1));
    }
    this.stage.setOther(this.other);
    this.applyMaterials();
  }

  /** Side by side or overlaid. */
  setLayout(layout: CompareLayout): void {
    if (layout === this.layout) return;
    this.layout = layout;
    this.stage.setLayout(layout);
    this.applyMaterials();
  }

  /** Turns the heat map on or off. */
  setHeatMap(on: boolean): void {
    if (on === this.heatOn) return;
    this.heatOn = on;
    this.refreshHeat();
  }

  /** The main take's weights or basis changed: repaint and rescale. */
  weightsChanged(): void {
    this.refreshHeat();
  }

  private refreshHeat(): void {
    const { model, otherModel } = this;
    if (!this.heatOn || !model || !this.basis) {
      this.mainPainter?.dispose();
      this.otherPainter?.dispose();
      this.mainPainter = this.otherPainter = null;
      this.events.onHeatScale?.(0);
      this.applyMaterials();
      return;
    }
    this.mainPainter ??= new HeatMapPainter(model.mesh.geometry);
    // Skinning alone shares the main geometry and has no dynamic offset: no colours for it.
    if (this.compare === 'take' && otherModel) {
      this.otherPainter ??= new HeatMapPainter(otherModel.mesh.geometry);
    }
    let peaks = Array.from(framePeaks(this.basis, model.k, model.dynamicWeights));
    if (this.otherPainter && otherModel) {
      const b = otherModel.take.basis;
      peaks = peaks.concat(Array.from(framePeaks(b, otherModel.k, otherModel.dynamicWeights)));
    }
    const peak = robustPeak(peaks);
    this.scaleMetres = niceCeil(peak * 1000) / 1000;
    this.events.onHeatScale?.(this.scaleMetres * 1000);
    this.applyMaterials();
    this.paint();
  }

  private applyMaterials(): void {
    this.main?.setMaterial(this.mainPainter?.material ?? null);
    const ghost = this.layout === 'overlay' ? this.stage.ghostMaterial : null;
    this.other?.setMaterial(ghost ?? this.otherPainter?.material ?? null);
    this.stage.invalidate();
  }

  private paint(): void {
    const { model, otherModel, basis } = this;
    if (this.mainPainter && model && basis) {
      const f = Math.min(this.frame, model.frameCount - 1);
      this.mainPainter.paint(basis, model.k, model.dynamicWeights, f, this.scaleMetres);
    }
    if (this.otherPainter && otherModel) {
      const f = Math.min(this.frame, otherModel.frameCount - 1);
      const b = otherModel.take.basis;
      this.otherPainter.paint(b, otherModel.k, otherModel.dynamicWeights, f, this.scaleMetres);
    }
  }

  /** Poses every take at frame `index` (and repaints the heat map). */
  setFrame(index: number): void {
    this.frame = index;
    this.stage.setFrame(index);
    this.paint();
  }

  /** Keeps the camera on the character as it travels, or leaves it where the user put it. */
  setFollow(on: boolean): void {
    this.stage.setFollow(on);
  }

  /** Points the camera at the main take. */
  frameCharacter(): void {
    this.stage.frameCharacter();
    this.framed = this.main !== null;
  }

  /** Resizes the drawing buffer (CSS pixels); the first real size frames the character. */
  setSize(width: number, height: number): void {
    this.stage.setSize(width, height);
    this.sized = width > 0 && height > 0;
    if (this.sized && !this.framed) this.frameCharacter();
  }

  /** Frees everything on the GPU. */
  dispose(): void {
    this.mainPainter?.dispose();
    this.otherPainter?.dispose();
    this.main?.dispose();
    this.other?.dispose();
    this.stage.dispose();
  }
}
