// Hairline cracks running from a deck construction joint, traced alongside in crayon by the
// inspector, with a tape laid across for scale (its marks only, no figures).
import { camera, type Vec3 } from '../camera';
import type { Random } from '../random';
import { attrs, face, newScene, type Scene } from '../svgKit';
import { mottle } from './deckParts';
import { broomMarks, grit } from './roadwayParts';

export function slabEdgeCracks(rng: Random, width: number, height: number): Scene {
  const scene = newScene(20, 4.5);
  const cam = camera({ eye: [0, 4.6, 0], yawDeg: rng.range(-20, 20), pitchDeg: rng.range(55, 62), rollDeg: rng.range(-3, 3), focalPx: 1300, width, height });
  const older = rng.pick(['#A9A79F', '#B0ADA4']);
  face(scene, cam, [[-12, 0, -2], [12, 0, -2], [12, 0, 14], [-12, 0, 14]], older, 1);
  mottle(scene, cam, rng, -8, 8, 0, 10, 0, 50, 0.12);
  broomMarks(scene, cam, rng, -8, 8, 0, 10, 900);
  // The joint: the later placement slightly darker, a thin dark line where they meet.
  const jz = rng.range(4.5, 5.5);
  const skew = rng.range(-0.25, 0.25);
  const at = (x: number, dz: number, y = 0): Vec3 => [x, y, jz + dz + x * skew];
  face(scene, cam, [at(-12, 0), at(12, 0), at(12, 9), at(-12, 9)], '#9C9A92', 1, { 'fill-opacity': 0.85 });
  face(scene, cam, [at(-12, -0.015, 0.002), at(12, -0.015, 0.002), at(12, 0.015, 0.002), at(-12, 0.015, 0.002)], '#3C3A35', 0);
  // Cracks leave the joint roughly square to it and wander; the inspector's crayon runs beside.
  const crayon = rng.pick(['#E8C21E', '#2F7FD0']);
  const cracks = rng.int(4, 6);
  for (let c = 0; c < cracks; c++) {
    const x0 = -4 + (8 * (c + rng.range(0.2, 0.8))) / cracks;
    const dir = rng.next() < 0.7 ? -1 : 1;
    let p: Vec3 = at(x0, 0, 0.003);
    let angle = rng.range(-0.25, 0.25);
    const pts: Vec3[] = [p];
    const steps = rng.int(20, 45);
    for (let s = 0; s < steps; s++) {
      angle += rng.normal() * 0.18;
      angle *= 0.9;
      p = [p[0] + Math.sin(angle) * 0.09, 0.003, p[2] + dir * Math.cos(angle) * 0.09];
      pts.push(p);
    }
    const screen = pts.map((q) => cam.project(q)).filter((q): q is readonly [number, number] => q !== null);
    if (screen.length < 2) continue;
    const d = screen.map((q, i) => `${i === 0 ? 'M' : 'L'}${q[0].toFixed(1)},${q[1].toFixed(1)}`).join(' ');
    scene.picture.push(`<path d="${d}" stroke="#D0CEC6" stroke-width="2.6" fill="none" stroke-opacity="0.5"/>`);
    scene.picture.push(`<path d="${d}" stroke="#262420" stroke-width="${rng.range(1.5, 2.2).toFixed(2)}" fill="none" stroke-linejoin="round"/>`);
    scene.mask.push(`<path d="${d}" stroke="#000" stroke-width="4" fill="none"/>`);
    // The crayon line, offset a little to one side and stopping short of the crack's end.
    const off = screen.slice(0, -4).map((q, i) => `${i === 0 ? 'M' : 'L'}${(q[0] + 14).toFixed(1)},${(q[1] + 2).toFixed(1)}`).join(' ');
    scene.picture.push(`<path d="${off}" stroke="${crayon}" stroke-width="5" fill="none" stroke-linecap="round" stroke-opacity="0.85"/>`);
    const end = screen[screen.length - 5];
    if (end) scene.picture.push(`<line ${attrs({ x1: end[0] + 4, y1: end[1] + 2, x2: end[0] + 24, y2: end[1] + 2, stroke: crayon, 'stroke-width': 5, 'stroke-linecap': 'round', 'stroke-opacity': 0.85 })}/>`);
  }
  grit(scene, cam, rng, -5, 5, 0, 9, 140);
  // A tape measure laid across the cracks: yellow blade, black marks at every inch.
  const tz = jz - rng.range(1.2, 2);
  const tx0 = rng.range(-4, -2);
  face(scene, cam, [[tx0, 0.01, tz], [tx0 + 5, 0.01, tz + 0.3], [tx0 + 5, 0.01, tz + 0.38], [tx0, 0.01, tz + 0.08]], '#E3BC25', 0.1);
  for (let i = 0; i <= 60; i++) {
    const x = tx0 + (5 * i) / 60;
    const z = tz + (0.3 * i) / 60;
    const long = i % 12 === 0 ? 0.06 : i % 6 === 0 ? 0.045 : 0.025;
    const a = cam.project([x, 0.012, z + 0.08 - long]);
    const b = cam.project([x, 0.012, z + 0.08]);
    if (a && b) scene.picture.push(`<line ${attrs({ x1: a[0], y1: a[1], x2: b[0], y2: b[1], stroke: '#1A1A1A', 'stroke-width': i % 12 === 0 ? 2 : 1.2 })}/>`);
  }
  // The tape's case at one end.
  const caseAt = cam.project([tx0 - 0.25, 0.1, tz]);
  if (caseAt) {
    const s = cam.pixels([tx0, 0, tz], 0.3);
    scene.picture.push(`<rect ${attrs({ x: caseAt[0] - s, y: caseAt[1] - s * 0.8, width: s * 1.6, height: s * 1.5, rx: s * 0.35, fill: '#2A2C2E' })}/><rect ${attrs({ x: caseAt[0] - s * 0.8, y: caseAt[1] - s * 0.6, width: s * 1.2, height: s * 1.1, rx: s * 0.3, fill: '#D8B21E' })}/>`);
  }
  return scene;
}
