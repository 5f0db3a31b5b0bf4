// The end of a day's placement: a timber bulkhead across the deck with the longitudinal bars and
// added dowels running through it, hardened concrete beyond and the open mat on this side.
import { camera, type Vec3 } from '../camera';
import type { Random } from '../random';
import { attrs, bar, face, newScene, type Scene } from '../svgKit';
import { barShadow, epoxy, mottle, stayInPlaceForms, surroundings } from './deckParts';

export function bulkheadWithDowels(rng: Random, width: number, height: number): Scene {
  const scene = newScene(20, 4.5);
  const eyeY = 4.8;
  const cam = camera({ eye: [rng.range(-2, 2), eyeY, 0], yawDeg: rng.range(-12, 12), pitchDeg: rng.range(34, 38), rollDeg: rng.range(-1.5, 1.5), focalPx: 1250, width, height });
  surroundings(scene, cam, rng, eyeY, 200);
  const bz = rng.range(6, 7); // the bulkhead's face
  const slab = 0.71; // 8.5 in deck (common practice)
  // Hardened concrete beyond, light and dry, with its broomed texture.
  face(scene, cam, [[-23, 0, bz], [23, 0, bz], [23, 0, 200], [-23, 0, 200]], '#A3A19A', 0.8);
  mottle(scene, cam, rng, -23, 23, bz, 80, 0, 60, 0.12);
  // The edger's smooth band along the bulkhead, and white curing sheet laid over the rest.
  face(scene, cam, [[-23, 0.001, bz + 0.12], [23, 0.001, bz + 0.12], [23, 0.001, bz + 0.4], [-23, 0.001, bz + 0.4]], '#B2B0A9', 0.4);
  const sheetZ = bz + rng.range(4, 7);
  const sheet: Vec3[] = [];
  for (let x = -23; x <= 23.01; x += 2) sheet.push([x, 0.02, sheetZ + rng.range(-0.4, 0.4)]);
  face(scene, cam, [...sheet, [23, 0.02, 200], [-23, 0.02, 200]], '#E4E6E3', 0.25, { 'fill-opacity': 0.92 });
  for (let i = 0; i < 26; i++) {
    const x = rng.range(-22, 20);
    const z = sheetZ + rng.range(0.5, 25);
    const a = cam.project([x, 0.03, z]);
    const b = cam.project([x + rng.range(1, 4), 0.03, z + rng.range(-1.5, 1.5)]);
    if (a && b) scene.picture.push(`<line ${attrs({ x1: a[0], y1: a[1], x2: b[0], y2: b[1], stroke: rng.next() < 0.5 ? '#B9BCBA' : '#FFFFFF', 'stroke-width': cam.pixels([x, 0, z], 0.12), 'stroke-opacity': 0.7, 'stroke-linecap': 'round' })}/>`);
  }
  // A timber laid on the sheet to hold it down.
  const tx = rng.range(-10, 6);
  const tz = sheetZ + rng.range(2, 5);
  bar(scene, cam, [tx, 0.15, tz], [tx + 10, 0.15, tz + rng.range(-1, 1)], 0.3, '#A9865A', '#CDAE84');
  // Forms and the open mats on this side.
  stayInPlaceForms(scene, cam, -23, 23, 0.2, bz, -slab);
  const d = 0.052;
  for (let z = 0.4; z < bz - 0.2; z += 0.667) {
    barShadow(scene, cam, [-23, -0.58, z], [23, -0.58, z], d, -slab);
    bar(scene, cam, [-23, -0.58, z], [23, -0.58, z], d, '#2E4E2C', '#5E8752');
  }
  for (let z = 0.6; z < bz - 0.2; z += 0.667) {
    barShadow(scene, cam, [-23, -0.2, z], [23, -0.2, z], d, -slab);
    bar(scene, cam, [-23, -0.2, z], [23, -0.2, z], d, epoxy.colour, epoxy.light);
  }
  // The bulkhead: two boards on edge, a seam, grain lines and grey paste that ran down them.
  const wood = rng.pick(['#B88D5C', '#C29A68', '#AE8457']);
  face(scene, cam, [[-23, -slab, bz], [23, -slab, bz], [23, 0.06, bz], [-23, 0.06, bz]], wood, 0.7);
  face(scene, cam, [[-23, 0.06, bz], [23, 0.06, bz], [23, 0.06, bz + 0.12], [-23, 0.06, bz + 0.12]], '#D4B488', 0.5);
  face(scene, cam, [[-23, -0.34, bz - 0.005], [23, -0.34, bz - 0.005], [23, -0.32, bz - 0.005], [-23, -0.32, bz - 0.005]], '#7A5C3A', 0.2);
  for (let i = 0; i < 40; i++) {
    const y = rng.range(-slab + 0.03, 0.03);
    const x = rng.range(-23, 20);
    const a = cam.project([x, y, bz - 0.01]);
    const b = cam.project([x + rng.range(1, 5), y + rng.range(-0.02, 0.02), bz - 0.01]);
    if (a && b) scene.picture.push(`<line ${attrs({ x1: a[0], y1: a[1], x2: b[0], y2: b[1], stroke: '#8A6640', 'stroke-width': 1.2, 'stroke-opacity': 0.5 })}/>`);
  }
  for (let i = 0; i < 16; i++) {
    const x = rng.range(-20, 20);
    const top = cam.project([x, 0.06, bz - 0.01]);
    const w = cam.pixels([x, 0, bz], rng.range(0.05, 0.2));
    const h = cam.pixels([x, 0, bz], rng.range(0.08, 0.4));
    if (top) scene.picture.push(`<path d="M${(top[0] - w).toFixed(1)},${top[1].toFixed(1)} q0,${(h * 0.8).toFixed(1)} ${w.toFixed(1)},${h.toFixed(1)} q${w.toFixed(1)},${(-h * 0.2).toFixed(1)} ${w.toFixed(1)},${(-h).toFixed(1)} z" fill="#9C9A93" fill-opacity="0.85"/>`);
  }
  // Bars and dowels through the bulkhead toward the camera, with a dark hole where each passes.
  const stick = (x: number, y: number, colour: string, light: string, length: number, diameter: number) => {
    const at: Vec3 = [x, y, bz - 0.02];
    const hole = cam.project(at);
    const r = cam.pixels(at, diameter * 0.9);
    if (hole) scene.picture.push(`<ellipse ${attrs({ cx: hole[0], cy: hole[1], rx: r, ry: r * 0.8, fill: '#3A2C1E' })}/>`);
    const end: Vec3 = [x + rng.range(-0.05, 0.05), y + rng.range(-0.02, 0.01), bz - length];
    barShadow(scene, cam, at, end, diameter, -slab);
    bar(scene, cam, at, end, diameter, colour, light);
  };
  for (let x = -22.6; x <= 23; x += 1) {
    stick(x, -0.5, '#2E4E2C', '#5E8752', rng.range(2.2, 3), d);
    stick(x + 0.5, -0.13, epoxy.colour, epoxy.light, rng.range(2.6, 3.4), d);
  }
  // Added dowels between the bars: plain steel, a little rust.
  for (let x = -22.1; x <= 23; x += 2) stick(x, -0.3, '#6B5B4B', '#A08A72', 1.5, 0.065);
  // Kickers bracing the bulkhead.
  for (let x = -21 + rng.range(0, 3); x <= 23; x += 8) {
    bar(scene, cam, [x, 0.0, bz - 0.05], [x + 0.2, -slab + 0.02, bz - 2.2], 0.25, '#B08858', '#D5B080');
  }
  return scene;
}
