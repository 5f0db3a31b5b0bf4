// Close up of a construction joint's face before the next placement: paste removed to a rough
// surface of exposed aggregate, the bars running through toward the camera, a folding rule held
// against the face for scale (marks only, no figures).
import { camera, type Vec3 } from '../camera';
import type { Random } from '../random';
import { attrs, bar, face, newScene, type Scene } from '../svgKit';
import { barShadow, epoxy, stayInPlaceForms, surroundings } from './deckParts';

const stones = ['#8E8A80', '#A39C8E', '#6F6A62', '#B5AD9D', '#7E7468', '#98918A', '#5F5B55', '#A8957B'];

export function roughenedJoint(rng: Random, width: number, height: number): Scene {
  const scene = newScene(30, 4.5);
  const eyeY = 0.2;
  const fz = 1.8; // the joint face, 1.8 ft in front of the lens
  const slab = 0.71;
  const cam = camera({ eye: [rng.range(-0.2, 0.2), eyeY, 0], yawDeg: rng.range(-8, 8), pitchDeg: rng.range(15, 19), rollDeg: rng.range(-2, 2), focalPx: 1250, width, height });
  surroundings(scene, cam, rng, eyeY + 30, 400);
  // Top of the hardened slab running away from the joint.
  face(scene, cam, [[-40, 0, fz], [40, 0, fz], [40, 0, 300], [-40, 0, 300]], '#A9A69E', 0.7);
  // The face: paste colour, then the stones standing out of it, each lit from the upper left.
  face(scene, cam, [[-3, -slab, fz], [3, -slab, fz], [3, 0, fz], [-3, 0, fz]], '#9D998F', 1);
  const pieces: string[] = [];
  for (let i = 0; i < 360; i++) {
    const x = rng.range(-1.6, 1.6);
    const y = rng.range(-slab + 0.01, -0.01);
    const c = cam.project([x, y, fz - 0.005]);
    if (!c) continue;
    const size = cam.pixels([x, y, fz], rng.range(0.01, 0.038));
    const rx = size;
    const ry = size * rng.range(0.55, 0.95);
    const turn = rng.range(0, 180).toFixed(0);
    const colour = rng.pick(stones);
    const g = `transform="rotate(${turn} ${c[0].toFixed(1)} ${c[1].toFixed(1)})"`;
    pieces.push(
      `<ellipse ${attrs({ cx: c[0] + size * 0.25, cy: c[1] + size * 0.3, rx: rx * 1.05, ry: ry * 1.05, fill: '#3F3C37', 'fill-opacity': 0.5 })} ${g}/>`,
      `<ellipse ${attrs({ cx: c[0], cy: c[1], rx, ry, fill: colour })} ${g}/>`,
    );
    if (size > 18) pieces.push(`<ellipse ${attrs({ cx: c[0] - size * 0.25, cy: c[1] - size * 0.25, rx: rx * 0.45, ry: ry * 0.35, fill: '#FFFFFF', 'fill-opacity': 0.22 })} ${g}/>`);
  }
  // Pits where paste came away.
  for (let i = 0; i < 120; i++) {
    const c = cam.project([rng.range(-1.6, 1.6), rng.range(-slab + 0.02, -0.02), fz - 0.004]);
    if (!c) continue;
    const r = cam.pixels([0, 0, fz], rng.range(0.006, 0.02));
    pieces.push(`<ellipse ${attrs({ cx: c[0], cy: c[1], rx: r, ry: r * 0.7, fill: '#4A463F', 'fill-opacity': 0.7 })}/>`);
  }
  scene.picture.push(`<g>${pieces.join('')}</g>`);
  // The arris: a chipped, lighter line along the top edge of the face.
  bar(scene, cam, [-3, -0.005, fz - 0.005], [3, -0.005, fz - 0.005], 0.012, '#C3BFB5', '#D9D5CC');
  // Forms below the face and the bars leaving it toward the camera.
  stayInPlaceForms(scene, cam, -3, 3, 0.3, fz, -slab);
  const d = 0.052;
  for (const [y, colour, light] of [[-0.56, '#2E4E2C', '#5E8752'], [-0.2, epoxy.colour, epoxy.light]] as const) {
    for (let x = -2.4 + rng.range(0, 0.3); x < 2.6; x += 0.667) {
      const from: Vec3 = [x, y, fz];
      const to: Vec3 = [x + rng.range(-0.03, 0.03), y + rng.range(-0.02, 0.0), fz - rng.range(0.5, 0.75)];
      const hole = cam.project(from);
      if (hole) scene.picture.push(`<ellipse ${attrs({ cx: hole[0], cy: hole[1], rx: cam.pixels(from, d * 0.75), ry: cam.pixels(from, d * 0.65), fill: '#34312C' })}/>`);
      // Close up, the shadow falls soft and pale on the bright forms.
      barShadow(scene, cam, from, to, d, -slab, 0.16);
      bar(scene, cam, from, to, d, colour, light);
    }
  }
  // Folding rule held against the face: yellow leaf, a mark every eighth of an inch in the view.
  const rx = rng.range(0.35, 0.7);
  face(scene, cam, [[rx, -slab, fz - 0.01], [rx + 0.055, -slab, fz - 0.01], [rx + 0.055, 0.12, fz - 0.01], [rx, 0.12, fz - 0.01]], '#E7C033', 0.1);
  for (let k = 0; k <= 80; k++) {
    const y = -slab + k / 96;
    if (y > 0.12) break;
    const len = k % 8 === 0 ? 0.03 : k % 4 === 0 ? 0.022 : 0.012;
    const a = cam.project([rx, y, fz - 0.012]);
    const b = cam.project([rx + len, y, fz - 0.012]);
    if (a && b) scene.picture.push(`<line ${attrs({ x1: a[0], y1: a[1], x2: b[0], y2: b[1], stroke: '#1A1A1A', 'stroke-width': k % 8 === 0 ? 2.2 : 1.3 })}/>`);
  }
  return scene;
}
