/**
 * The 3D preview's renderer, camera, lights, orbit controls and draw loop, in plain three.js (no
 * React, no second React renderer): the scene chunk carries only the parts of three it uses, so it
 * downloads and starts in a fraction of the time a whole-library renderer needs. It draws on
 * demand only — a new design, a camera move, a resize — never on a re-render of the page.
 *
 * The first frame waits until every shader program is compiled (the browser compiles them off
 * the main thread where it can), so it is complete and nothing compiles after it.
 */
import { ACESFilmicToneMapping, Color, DirectionalLight, HemisphereLight, PerspectiveCamera, Scene, Vector3, WebGLRenderer, type Camera } from "three";
import { OrbitControls } from "three/examples/jsm/controls/OrbitControls.js";
import type { PreviewGeometry } from "@/engine/geometry/preview";
import { cameraForView, type Bounds, type ViewName } from "./camera-framing";
import { buildParts, type SceneParts } from "./scene-parts";
import { COLOURS } from "./scene-style";

export interface SceneViewOptions {
  /** The element the canvas fills (its size is the canvas's size). */
  host: HTMLElement;
  /** A software renderer: one pixel per CSS pixel and no multisampling, so a frame costs the CPU a fraction. */
  software: boolean;
  /** Runs before each frame is drawn, with the camera where it will be drawn from (the labels follow it). */
  onFrame: (camera: Camera, size: { width: number; height: number }) => void;
  /** The first frame is on screen. */
  onReady: () => void;
  onContextLost: () => void;
}

export class SceneView {
  readonly canvas: HTMLCanvasElement;
  private readonly renderer: WebGLRenderer;
  private readonly camera = new PerspectiveCamera(35, 1, 0.1, 1000);
  private readonly scene = new Scene();
  private readonly sun = new DirectionalLight(0xffffff, 1.8);
  private readonly controls: OrbitControls;
  private readonly resizeObserver: ResizeObserver;
  private readonly options: SceneViewOptions;
  private size = { width: 0, height: 0 };
  private parts: SceneParts | null = null;
  private bounds: Bounds | null = null;
  private viewName: ViewName = "home";
  private viewSeq: number | null = null;
  private framedRadius: number | null = null;
  /** Where an eased camera move is heading (null when the camera is where it should be). */
  private goal: { position: Vector3; target: Vector3 } | null = null;
  private frame = 0;
  private state: "new" | "compiling" | "ready" | "disposed" = "new";
  /** The first frame has been drawn (and `onReady` told). */
  private shown = false;

  constructor(options: SceneViewOptions) {
    this.options = options;
    // A canvas of its own per view: a disposed view loses its context, and a remount (React's
    // development double mount included) must not inherit the lost one.
    this.canvas = document.createElement("canvas");
    this.canvas.style.display = "block";
    this.canvas.addEventListener("webglcontextlost", this.onContextLost, { once: true });
    // Throws where the context cannot be made; the preview's error boundary shows the elevation.
    this.renderer = new WebGLRenderer({ canvas: this.canvas, antialias: !options.software, alpha: false, powerPreference: "high-performance" });
    // Each check is a round trip to the GPU process that waits for the compile; three.js advises
    // turning it off in production (a failed program still draws nothing).
    this.renderer.debug.checkShaderErrors = process.env.NODE_ENV !== "production";
    this.renderer.toneMapping = ACESFilmicToneMapping;
    this.renderer.setPixelRatio(options.software ? 1 : Math.min(Math.max(window.devicePixelRatio || 1, 1), 2));
    options.host.appendChild(this.canvas);

    this.scene.background = new Color(COLOURS.background);
    this.scene.add(new HemisphereLight(0xffffff, 0x6b705c, 1.4), this.sun);

    this.controls = new OrbitControls(this.camera, this.canvas);
    this.controls.enableDamping = false;
    this.controls.addEventListener("change", this.invalidate);

    const box = options.host.getBoundingClientRect();
    this.resize(box.width, box.height);
    this.resizeObserver = new ResizeObserver((entries) => {
      const r = entries[entries.length - 1].contentRect;
      if (r.width !== this.size.width || r.height !== this.size.height) this.resize(r.width, r.height);
    });
    this.resizeObserver.observe(options.host);
  }

  /** A new design: its parts replace the old ones (same shapes and materials, new buffers). */
  setGeometry(g: PreviewGeometry, bounds: Bounds): void {
    if (this.state === "disposed") return;
    const old = this.parts;
    this.parts = buildParts(g, bounds);
    this.scene.add(this.parts.group);
    if (old) {
      this.scene.remove(old.group);
      old.dispose();
    }
    const c = bounds.centre, r = bounds.radiusFt;
    this.sun.position.set(c[0] + r, c[1] + 2 * r, c[2] + 1.5 * r);
    this.bounds = bounds;
    this.frameCamera(false);
    if (this.state === "new") this.compileThenDraw();
    this.invalidate();
  }

  /** A named view asked for (each press has a new `seq`, so pressing the same view again re-frames). */
  setView(view: { name: ViewName; seq: number }): void {
    this.viewName = view.name;
    const asked = this.viewSeq !== view.seq;
    this.viewSeq = view.seq;
    if (asked) this.frameCamera(true);
  }

  setZoom(enabled: boolean): void {
    this.controls.enableZoom = enabled;
  }

  /** Asks for one frame (several asks before it draws make one frame). */
  invalidate = (): void => {
    if (this.state !== "ready" || this.frame) return;
    this.frame = requestAnimationFrame(this.draw);
  };

  dispose(): void {
    if (this.state === "disposed") return;
    this.state = "disposed";
    cancelAnimationFrame(this.frame);
    this.resizeObserver.disconnect();
    this.controls.removeEventListener("change", this.invalidate);
    this.controls.dispose();
    this.parts?.dispose();
    this.canvas.removeEventListener("webglcontextlost", this.onContextLost);
    this.renderer.renderLists.dispose();
    this.renderer.dispose();
    // Browsers allow a page only a few live contexts: give this one back now.
    this.renderer.forceContextLoss();
    this.canvas.remove();
  }

  private onContextLost = () => this.options.onContextLost();

  private compileThenDraw(): void {
    this.state = "compiling";
    const go = () => {
      if (this.state !== "compiling") return;
      this.state = "ready";
      this.invalidate();
    };
    // Where the browser compiles in parallel, wait for every program without blocking the page.
    // Elsewhere (software renderers) the compile starts now, in the GPU process, and the first
    // frame follows on the next animation frame (what compileAsync would do there, less its
    // console warning about the missing extension).
    if (this.renderer.extensions.has("KHR_parallel_shader_compile")) this.renderer.compileAsync(this.scene, this.camera).then(go, go);
    else {
      this.renderer.compile(this.scene, this.camera);
      go();
    }
  }

  private resize(width: number, height: number): void {
    this.size = { width, height };
    this.renderer.setSize(width, height);
    this.camera.aspect = width / Math.max(height, 1);
    this.camera.updateProjectionMatrix();
    this.invalidate();
  }

  /**
   * Frames the scene for the current view: on the first design, when asked (a view button), or
   * when the design's size changed a lot (so a user's orbit survives small edits). The first
   * framing is immediate; later ones are eased over a few frames.
   */
  private frameCamera(asked: boolean): void {
    const bounds = this.bounds;
    if (!bounds) return;
    const resized = this.framedRadius === null || Math.abs(bounds.radiusFt - this.framedRadius) > this.framedRadius * 0.2;
    if (!resized && !asked) return;
    const first = this.framedRadius === null;
    this.framedRadius = bounds.radiusFt;
    const camera = this.camera;
    const fit = cameraForView(this.viewName, bounds, camera.fov, this.size.width / Math.max(this.size.height, 1));
    camera.near = Math.max(0.05, fit.distanceFt / 200);
    camera.far = fit.distanceFt * 10;
    camera.updateProjectionMatrix();
    this.goal = { position: new Vector3(...fit.position), target: new Vector3(...fit.target) };
    if (first) {
      camera.position.copy(this.goal.position);
      camera.lookAt(this.goal.target);
      this.controls.target.copy(this.goal.target);
      this.controls.update();
      this.goal = null;
    }
    this.invalidate();
  }

  private draw = (): void => {
    // `frame` stays set while drawing: asks made by this frame's own moves (the controls' change
    // event) are already in it.
    if (this.state !== "ready") {
      this.frame = 0;
      return;
    }
    const g = this.goal;
    if (g) {
      this.camera.position.lerp(g.position, 0.25);
      this.controls.target.lerp(g.target, 0.25);
      if (this.camera.position.distanceTo(g.position) < this.framedRadius! * 1e-3) {
        this.camera.position.copy(g.position);
        this.controls.target.copy(g.target);
        this.goal = null;
      }
      this.controls.update();
    }
    this.camera.updateMatrixWorld();
    this.options.onFrame(this.camera, this.size);
    this.renderer.render(this.scene, this.camera);
    this.frame = 0;
    if (this.goal) this.invalidate();
    if (!this.shown) {
      this.shown = true;
      this.options.onReady();
    }
  };
}
