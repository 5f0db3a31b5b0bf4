// Parts of a finished deck: the barrier along each side, broom marks and loose grit.
import type { Camera } from '../camera';
import type { Random } from '../random';
import { attrs, face, type Scene } from '../svgKit';

// A safety-shape concrete barrier: sloped lower face, steeper upper face, flat top.
export function barrier(scene: Scene, cam: Camera, side: -1 | 1, atX: number, z0: number, z1: number): void {
  const x = side * atX;
  const profile: [number, number][] = [[0, 0], [0.25, 0.25], [0.5, 1.1], [0.75, 2.7], [1.5, 2.7]];
  const shades = ['#B3B0A7', '#C4C1B8', '#BCB9B0', '#D3D0C8'];
  for (let i = 0; i < profile.length - 1; i++) {
    const [a, ay] = profile[i]!;
    const [b, by] = profile[i + 1]!;
    face(scene, cam, [[x + side * a, ay, z0], [x + side * b, by, z0], [x + side * b, by, z1], [x + side * a, ay, z1]], shades[i]!, 0.8);
  }
  // Contraction joints in the barrier every 20 ft or so.
  for (let z = z0 + 12; z < Math.min(z1, 200); z += 20) {
    face(scene, cam, [[x + side * 0.5, 1.1, z], [x + side * 0.75, 2.7, z], [x + side * 0.75, 2.7, z + 0.05], [x + side * 0.5, 1.1, z + 0.05]], '#77756F', 0);
  }
}

// Broom finish: short faint strokes across the deck, denser and finer with distance.
export function broomMarks(scene: Scene, cam: Camera, rng: Random, x0: number, x1: number, z0: number, z1: number, count: number): void {
  const strokes: string[] = [];
  for (let i = 0; i < count; i++) {
    const z = z0 + (z1 - z0) * rng.next() ** 1.6;
    const x = rng.range(x0, x1);
    const a = cam.project([x, 0, z]);
    const b = cam.project([Math.min(x1, x + rng.range(0.3, 1.2)), 0, z + rng.range(-0.04, 0.04)]);
    if (!a || !b) continue;
    strokes.push(`<line ${attrs({ x1: a[0], y1: a[1], x2: b[0], y2: b[1], 'stroke-width': Math.max(0.5, cam.pixels([x, 0, z], 0.01)) })}/>`);
  }
  scene.picture.push(`<g stroke="#5E5D57" stroke-opacity="0.16">${strokes.join('')}</g>`);
}

// Small stones and sand on the surface.
export function grit(scene: Scene, cam: Camera, rng: Random, x0: number, x1: number, z0: number, z1: number, count: number): void {
  for (let i = 0; i < count; i++) {
    const p = cam.project([rng.range(x0, x1), 0, rng.range(z0, z1)]);
    if (!p) continue;
    const r = cam.pixels([0, 0, (z0 + z1) / 2], rng.range(0.01, 0.04));
    scene.picture.push(`<ellipse ${attrs({ cx: p[0], cy: p[1], rx: r, ry: r * 0.6, fill: rng.pick(['#5C5850', '#8A8275', '#3F3C37', '#B0A895']) })}/>`);
  }
}
