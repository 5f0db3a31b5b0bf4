// A finger joint across the deck: two steel plates whose teeth interlock over the opening, the
// dark trough below showing between them, bolt heads in rows, barriers either side.
import { camera } from '../camera';
import type { Random } from '../random';
import { attrs, face, newScene, type Scene } from '../svgKit';
import { mottle, surroundings } from './deckParts';
import { barrier, broomMarks, grit } from './roadwayParts';

export function fingerJoint(rng: Random, width: number, height: number): Scene {
  const scene = newScene(20, 4.5);
  const eyeY = 5.1;
  const half = 20;
  const cam = camera({ eye: [half - rng.range(5, 8), eyeY, 0], yawDeg: -rng.range(8, 16), pitchDeg: rng.range(33, 37), rollDeg: rng.range(-1.5, 1.5), focalPx: 1250, width, height });
  surroundings(scene, cam, rng, eyeY, 300);
  const jz = rng.range(5, 5.8);
  const open = rng.range(0.25, 0.4); // clear opening between the tips of the teeth and the far plate
  const tooth = 0.9; // teeth overlap along the traffic direction
  const plate = 1.3;
  const far = jz + tooth + open;
  face(scene, cam, [[-half, 0, -1], [half, 0, -1], [half, 0, jz - plate], [-half, 0, jz - plate]], '#A6A49D', 0.85);
  face(scene, cam, [[-half, 0, far + plate], [half, 0, far + plate], [half, 0, 300], [-half, 0, 300]], '#9E9C95', 0.85);
  broomMarks(scene, cam, rng, -half, half, -1, jz - plate, 500);
  broomMarks(scene, cam, rng, -half, half, far + plate, 60, 700);
  mottle(scene, cam, rng, -half, half, -1, 60, 0, 40, 0.1);
  // The trough under the teeth, then the two plates and their teeth.
  face(scene, cam, [[-half, -0.01, jz], [half, -0.01, jz], [half, -0.01, far], [-half, -0.01, far]], '#121212', 0);
  const steel = rng.pick(['#6C6E6A', '#74736C']);
  face(scene, cam, [[-half, 0.01, jz - plate], [half, 0.01, jz - plate], [half, 0.01, jz], [-half, 0.01, jz]], steel, 0.6);
  face(scene, cam, [[-half, 0.01, far], [half, 0.01, far], [half, 0.01, far + plate], [-half, 0.01, far + plate]], steel, 0.6);
  const pitch = 0.5;
  // Teeth of 0.21 ft on a 0.5 ft pitch leave about 1/2 in clear either side of each tooth.
  const toothWidth = 0.21;
  for (let x = -half; x < half; x += pitch) {
    // Near teeth reach across the opening; far teeth reach back between them, each tapering a little.
    face(scene, cam, [[x, 0.01, jz - 0.01], [x + toothWidth, 0.01, jz - 0.01], [x + toothWidth - 0.015, 0.01, jz + tooth], [x + 0.015, 0.01, jz + tooth]], steel, 0.6);
    face(scene, cam, [[x + toothWidth - 0.02, 0.011, jz], [x + toothWidth, 0.011, jz], [x + toothWidth - 0.015, 0.011, jz + tooth], [x + toothWidth - 0.03, 0.011, jz + tooth]], '#9A9B95', 0.2);
    const fx = x + pitch / 2;
    face(scene, cam, [[fx + 0.015, 0.012, far - tooth], [fx + toothWidth - 0.015, 0.012, far - tooth], [fx + toothWidth, 0.012, far + 0.01], [fx, 0.012, far + 0.01]], steel, 0.6);
    face(scene, cam, [[fx + toothWidth - 0.035, 0.013, far - tooth], [fx + toothWidth - 0.015, 0.013, far - tooth], [fx + toothWidth, 0.013, far], [fx + toothWidth - 0.02, 0.013, far]], '#9A9B95', 0.2);
  }
  // Rust blooms on the plates and the bright wear of tyres along the wheel paths.
  scene.defs.push(`<radialGradient id="rust"><stop offset="0" stop-color="#8A4E2B" stop-opacity="0.55"/><stop offset="1" stop-color="#8A4E2B" stop-opacity="0"/></radialGradient>`);
  for (let i = 0; i < 40; i++) {
    const z = rng.next() < 0.5 ? rng.range(jz - plate, jz + tooth) : rng.range(far - tooth, far + plate);
    const p = cam.project([rng.range(-half, half), 0.02, z]);
    if (!p) continue;
    const r = cam.pixels([0, 0, z], rng.range(0.1, 0.5));
    scene.picture.push(`<ellipse ${attrs({ cx: p[0], cy: p[1], rx: r, ry: r * 0.4, fill: 'url(#rust)' })}/>`);
  }
  // Bolt heads in two rows on each plate.
  for (const z of [jz - plate + 0.3, jz - 0.35, far + 0.35, far + plate - 0.3]) {
    for (let x = -half + 0.6; x < half; x += 1.5) {
      const p = cam.project([x, 0.02, z]);
      if (!p) continue;
      const r = cam.pixels([x, 0, z], 0.07);
      scene.picture.push(`<ellipse ${attrs({ cx: p[0], cy: p[1], rx: r, ry: r * 0.45, fill: '#3E3F3C' })}/><ellipse ${attrs({ cx: p[0] - r * 0.2, cy: p[1] - r * 0.12, rx: r * 0.55, ry: r * 0.22, fill: '#9A9B96' })}/>`);
    }
  }
  for (const side of [-1, 1] as const) barrier(scene, cam, side, half, -1, 300);
  grit(scene, cam, rng, -half, half, jz - 3, far + 3, 120);
  return scene;
}
