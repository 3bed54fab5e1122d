// Runs inside headless Chromium: draws every character with three.js (rest pose, a mid-clip frame,
// regions from the front and from behind) and every capture (skinning alone and the capture at
// its liveliest frame, with a heat map of the difference) into one labelled sheet, returned as a
// PNG data URL. Self-contained on purpose: Playwright sends this function's source to the page.
import type * as Three from 'three';

/** One column of the sheet. */
export interface SheetItem {
  kind: 'character' | 'capture';
  title: string;
  subtitle: string;
  /** The .glb to show (a character, or a capture bound to its character). */
  url: string;
  /** The character a capture is registered to (captures only). */
  characterUrl: string | null;
  /** A clip .glb to pose a character with (characters only). */
  clipUrl: string | null;
  clipLabel: string;
  /** Time to show (s); null for the middle of the clip. */
  time: number | null;
}

/** What the page draws. */
export interface SheetSpec {
  items: SheetItem[];
  cellWidth: number;
  cellHeight: number;
  /** Rows to draw (0 rest or skinning, 1 posed or capture, 2–3 front and back); all when empty. */
  rows: number[];
}

/** Renders the sheet; resolves to a PNG data URL. */
export async function renderContactSheet(spec: SheetSpec): Promise<string> {
  const THREE = (await import('three' as string)) as typeof Three;
  const { GLTFLoader } = await import('three/addons/loaders/GLTFLoader.js' as string);
  const loader = new GLTFLoader();
  const { cellWidth: w, cellHeight: h, items } = spec;
  const slot = (row: number) => (spec.rows.length ? spec.rows.indexOf(row) : row);
  const header = 64;
  const rowLabel = 26;
  const sheet = document.createElement('canvas');
  sheet.width = w * items.length;
  sheet.height = header + (spec.rows.length || 4) * (h + rowLabel);
  const ctx = sheet.getContext('2d')!;
  ctx.fillStyle = '#1d1f22';
  ctx.fillRect(0, 0, sheet.width, sheet.height);
  const renderer = new THREE.WebGLRenderer({ antialias: true, preserveDrawingBuffer: true });
  renderer.setSize(w, h);
  renderer.setClearColor(0x2a2d31);
  const palette = [
    0x8a8f96, 0xe8a33d, 0x5fb3d9, 0xd9675f, 0x9b6fd9, 0x6fd98a, 0xd9c35f, 0x5f7ad9, 0xd95fb0,
    0x5fd9d0, 0xb0d95f,
  ];
  const tones = [0xd8b49a, 0xe6c7ad, 0x8c7566];
  const hex = (c: number) => `#${c.toString(16).padStart(6, '0')}`;

  const draw = (
    obj: Three.Object3D,
    box: Three.Box3,
    yaw: number,
    col: number,
    row: number,
    label: string,
  ) => {
    // prettier-ignore
    if (slot(row) < 0) return;
    const scene = new THREE.Scene();
    scene.add(new THREE.HemisphereLight(0xffffff, 0x404048, 1.6));
    const key = new THREE.DirectionalLight(0xffffff, 2.2);
    key.position.set(1.5, 2.5, 3);
    scene.add(key);
    const rim = new THREE.DirectionalLight(0xffe8cc, 0.8);
    rim.position.set(-2, 1, -2);
    scene.add(rim);
    // Turn the subject about its own centre, wherever the clip has taken it.
    const size = box.getSize(new THREE.Vector3());
    const centre = box.getCenter(new THREE.Vector3());
    const inner = new THREE.Group();
    inner.position.copy(centre).negate();
    inner.add(obj);
    const pivot = new THREE.Group();
    pivot.add(inner);
    pivot.rotation.y = yaw;
    scene.add(pivot);
    const camera = new THREE.PerspectiveCamera(28, w / h, 0.05, 50);
    const fit = Math.max(size.y, (Math.max(size.x, size.z) * h) / w) * 1.12;
    camera.position.set(0, 0, fit / 2 / Math.tan((28 * Math.PI) / 360) + size.z / 2);
    camera.lookAt(0, 0, 0);
    renderer.render(scene, camera);
    const y = header + slot(row) * (h + rowLabel);
    ctx.drawImage(renderer.domElement, col * w, y + rowLabel);
    ctx.fillStyle = '#c8ccd2';
    ctx.font = '14px monospace';
    ctx.fillText(label, col * w + 10, y + 18);
    inner.remove(obj);
  };
  const legend = (col: number, row: number, entries: [string, number][]) => {
    if (slot(row) < 0) return;
    ctx.font = '12px monospace';
    entries.forEach(([name, colour], k) => {
      const x = col * w + 10;
      const y = header + slot(row) * (h + rowLabel) + rowLabel + 16 + 16 * k;
      ctx.fillStyle = hex(colour);
      ctx.fillRect(x, y - 10, 10, 10);
      ctx.fillStyle = '#e6e8eb';
      ctx.fillText(name, x + 16, y);
    });
  };
  const posedBox = (mesh: Three.SkinnedMesh) => {
    const box = new THREE.Box3();
    mesh.skeleton.bones.forEach((b) => box.expandByPoint(b.getWorldPosition(new THREE.Vector3())));
    return box.expandByScalar(0.25);
  };

  for (let col = 0; col < items.length; col++) {
    const item = items[col];
    const gltf = await loader.loadAsync(item.url);
    const root = gltf.scene as Three.Object3D;
    const charRoot = item.characterUrl
      ? ((await loader.loadAsync(item.characterUrl)).scene as Three.Object3D)
      : root;
    const mixer = new THREE.AnimationMixer(charRoot);
    let found: Three.SkinnedMesh | null = null;
    charRoot.traverse((o: Three.Object3D) => {
      if ((o as Three.SkinnedMesh).isSkinnedMesh) found = o as Three.SkinnedMesh;
    });
    const mesh = found as unknown as Three.SkinnedMesh;
    mesh.frustumCulled = false;
    const geometry = mesh.geometry;
    const count = geometry.getAttribute('position').count;
    const colours = new Float32Array(3 * count);
    geometry.setAttribute('color', new THREE.BufferAttribute(colours, 3));
    const shaded = new THREE.MeshStandardMaterial({ color: tones[col % tones.length], roughness: 0.55 }); // prettier-ignore
    const coloured = new THREE.MeshStandardMaterial({ vertexColors: true, roughness: 0.7 });
    const restBox = new THREE.Box3().setFromBufferAttribute(geometry.getAttribute('position') as Three.BufferAttribute); // prettier-ignore
    ctx.fillStyle = '#f0f2f5';
    ctx.font = 'bold 17px sans-serif';
    ctx.fillText(item.title, col * w + 10, 24);
    ctx.fillStyle = '#9aa0a8';
    ctx.font = '13px monospace';
    ctx.fillText(item.subtitle, col * w + 10, 46);
    mesh.material = shaded;

    if (item.kind === 'character') {
      draw(root, restBox, 0.35, col, 0, 'rest pose');
      if (item.clipUrl) {
        const clip = (await loader.loadAsync(item.clipUrl)).animations[0] as Three.AnimationClip;
        mixer.clipAction(clip).play();
        const time = item.time ?? clip.duration / 2;
        mixer.setTime(time);
        root.updateMatrixWorld(true);
        draw(root, posedBox(mesh), 0.6, col, 1, `${item.clipLabel} @ ${time.toFixed(2)} s`);
        mixer.stopAllAction();
        mesh.skeleton.pose();
      }
      const region = geometry.getAttribute('_region') as Three.BufferAttribute | undefined;
      const c = new THREE.Color();
      for (let i = 0; i < count; i++) {
        c.setHex(palette[Math.round(region ? region.getX(i) : 0) % palette.length]);
        colours.set([c.r, c.g, c.b], 3 * i);
      }
      geometry.getAttribute('color').needsUpdate = true;
      mesh.material = coloured;
      draw(root, restBox, 0, col, 2, 'regions, front');
      draw(root, restBox, Math.PI, col, 3, 'regions, back');
      const names: string[] = gltf.userData?.overshoot?.regions ?? [];
      legend(
        col,
        2,
        names.map((n, k) => [n, palette[k % palette.length]]),
      );
      continue;
    }

    // A capture: its animation selects one morph target (posed positions) per frame and drives
    // the joints, which pose the character for the skinning-alone comparison.
    let captureMesh: Three.Mesh | null = null;
    root.traverse((o: Three.Object3D) => {
      const m = o as Three.Mesh;
      if (m.isMesh && m.morphTargetInfluences?.length) captureMesh = m;
    });
    const cap = captureMesh as unknown as Three.Mesh;
    const clip = gltf.animations[0] as Three.AnimationClip;
    const time = item.time ?? clip.duration / 2;
    const capMixer = new THREE.AnimationMixer(root);
    capMixer.clipAction(clip).play();
    capMixer.setTime(time);
    root.updateMatrixWorld(true);
    const captured = Array.from({ length: count }, (_, i) => cap.getVertexPosition(i, new THREE.Vector3()).applyMatrix4(cap.matrixWorld)); // prettier-ignore
    const box = new THREE.Box3().setFromPoints(captured).expandByScalar(0.05);
    const joints = clip.tracks.filter((t) => !t.name.endsWith('.morphTargetInfluences'));
    mixer.clipAction(new THREE.AnimationClip('joints', clip.duration, joints)).play();
    mixer.setTime(time);
    charRoot.updateMatrixWorld(true);
    const skinned = Array.from({ length: count }, (_, i) => mesh.getVertexPosition(i, new THREE.Vector3()).applyMatrix4(mesh.matrixWorld)); // prettier-ignore
    draw(charRoot, box, 0.6, col, 0, `skinning alone @ ${time.toFixed(2)} s`);
    cap.material = shaded;
    draw(root, box, 0.6, col, 1, `capture @ ${time.toFixed(2)} s`);
    // Heat map of what the capture adds to skinning: grey at 0, orange at 15 mm, red at 30 mm.
    const grey = new THREE.Color(0x8a8f96);
    const orange = new THREE.Color(0xe8a33d);
    const red = new THREE.Color(0xe0453a);
    const heat = new Float32Array(3 * count);
    const c = new THREE.Color();
    for (let i = 0; i < count; i++) {
      const d = Math.min(1, captured[i].distanceTo(skinned[i]) / 0.03);
      if (d < 0.5) c.lerpColors(grey, orange, d * 2);
      else c.lerpColors(orange, red, d * 2 - 1);
      heat.set([c.r, c.g, c.b], 3 * i);
    }
    cap.geometry.setAttribute('color', new THREE.BufferAttribute(heat, 3));
    cap.material = coloured;
    draw(root, box, 0.6, col, 2, 'displacement, front');
    draw(root, box, 0.6 + Math.PI, col, 3, 'displacement, back');
    legend(col, 2, [
      ['0 mm', 0x8a8f96],
      ['15 mm', 0xe8a33d],
      ['30 mm or more', 0xe0453a],
    ]);
  }
  return sheet.toDataURL('image/png');
}
