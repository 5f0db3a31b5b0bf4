// A finished strip seal across the deck: steel edge rails flush with the concrete headers, the
// black gland between them, turning up the barrier face at the curb.
import { camera, type Vec3 } from '../camera';
import type { Random } from '../random';
import { attrs, bar, face, newScene, type Scene } from '../svgKit';
import { mottle, surroundings } from './deckParts';
import { barrier, broomMarks, grit } from './roadwayParts';

export function stripSealInstalled(rng: Random, width: number, height: number): Scene {
  const scene = newScene(24, 4.5);
  const eyeY = 5.2;
  const half = 20;
  // Standing near the right-hand barrier, looking down the joint toward the far curb.
  const cam = camera({ eye: [half - rng.range(4, 6), eyeY, 0], yawDeg: -rng.range(12, 20), pitchDeg: rng.range(26, 30), rollDeg: rng.range(-1.5, 1.5), focalPx: 1250, width, height });
  surroundings(scene, cam, rng, eyeY, 260);
  const jz = rng.range(8, 9.5);
  const gap = rng.range(0.13, 0.2); // about 2 in open at the day's temperature
  // Deck concrete either side, the far side a shade darker (the older placement).
  face(scene, cam, [[-half, 0, -1], [half, 0, -1], [half, 0, jz - 1.25], [-half, 0, jz - 1.25]], '#A8A69F', 0.85);
  face(scene, cam, [[-half, 0, jz + gap + 1.25], [half, 0, jz + gap + 1.25], [half, 0, 260], [-half, 0, 260]], '#9B9A93', 0.85);
  broomMarks(scene, cam, rng, -half, half, -1, jz - 1.25, 500);
  broomMarks(scene, cam, rng, -half, half, jz + gap + 1.25, 70, 700);
  mottle(scene, cam, rng, -half, half, -1, 60, 0, 50, 0.1);
  // Headers: a foot of darker blockout concrete against each rail.
  face(scene, cam, [[-half, 0, jz - 1.25], [half, 0, jz - 1.25], [half, 0, jz - 0.2], [-half, 0, jz - 0.2]], '#85847E', 0.9);
  face(scene, cam, [[-half, 0, jz + gap + 0.2], [half, 0, jz + gap + 0.2], [half, 0, jz + gap + 1.25], [-half, 0, jz + gap + 1.25]], '#81807A', 0.9);
  // Rails: the top of each steel extrusion, worn bright along its edge.
  for (const [z0, z1] of [[jz - 0.28, jz], [jz + gap, jz + gap + 0.28]] as const) {
    face(scene, cam, [[-half, 0.003, z0], [half, 0.003, z0], [half, 0.003, z1], [-half, 0.003, z1]], '#5E6265', 0.15);
    bar(scene, cam, [-half, 0.006, z0 + 0.01], [half, 0.006, z0 + 0.01], 0.025, '#A5AAAD', '#D0D4D6');
  }
  // The gland, sagging into the gap: dark rubber with a soft highlight along the fold.
  scene.defs.push(`<linearGradient id="gland" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#0E0E0E"/><stop offset="0.55" stop-color="#2A2A2A"/><stop offset="1" stop-color="#111111"/></linearGradient>`);
  face(scene, cam, [[-half, -0.005, jz], [half, -0.005, jz], [half, -0.005, jz + gap], [-half, -0.005, jz + gap]], 'url(#gland)', 0);
  bar(scene, cam, [-half, -0.01, jz + gap * 0.55], [half, -0.01, jz + gap * 0.55], 0.012, '#4A4A4A', '#6A6A6A', 0.5);
  // Barriers on both sides with the seal turned up their faces.
  for (const side of [-1, 1] as const) {
    barrier(scene, cam, side, half, -1, 260);
    const up: Vec3[] = [[side * half, 0, jz], [side * half, 0, jz + gap], [side * (half - 0.05), 2.6, jz + gap], [side * (half - 0.05), 2.6, jz]];
    face(scene, cam, up, '#151515', 0);
  }
  grit(scene, cam, rng, -half, half, jz - 2, jz + 3, 90);
  // A cone left by the crew.
  const cone = cam.project([rng.range(-14, -8), 0, jz + rng.range(4, 9)]);
  if (cone) {
    const h = cam.pixels([0, 0, jz + 6], 2.3);
    scene.picture.push(`<polygon points="${cone[0] - h * 0.3},${cone[1]} ${cone[0] + h * 0.3},${cone[1]} ${cone[0] + h * 0.06},${cone[1] - h} ${cone[0] - h * 0.06},${cone[1] - h}" fill="#E8651E"/>`);
    scene.picture.push(`<polygon points="${cone[0] - h * 0.17},${cone[1] - h * 0.55} ${cone[0] + h * 0.17},${cone[1] - h * 0.55} ${cone[0] + h * 0.12},${cone[1] - h * 0.72} ${cone[0] - h * 0.12},${cone[1] - h * 0.72}" fill="#ECECEC"/>`);
    scene.picture.push(`<rect ${attrs({ x: cone[0] - h * 0.42, y: cone[1] - h * 0.05, width: h * 0.84, height: h * 0.07, fill: '#C9561A' })}/>`);
  }
  return scene;
}
